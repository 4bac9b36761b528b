import type { ReactNode } from "react";
import { Button } from "./button";
import { CheckCircleIcon } from "./icons";

/**
 * A settings form's save button with its confirmation beside it, read out by screen readers
 * (`role="status"`). `saved` is the confirmation to show, or null.
 */
export function SaveRow({ label, busy, unchanged, saved }: { label: string; busy: boolean; unchanged: boolean; saved: ReactNode | null }) {
  return (
    <div className="mt-4 flex flex-wrap items-center gap-3">
      <Button type="submit" variant="primary" busy={busy} disabled={unchanged && !busy}>
        {label}
      </Button>
      <p role="status" className="flex items-center gap-1.5 font-bold text-ok">
        {saved !== null ? (
          <>
            <CheckCircleIcon className="size-5" /> {saved}
          </>
        ) : null}
      </p>
    </div>
  );
}
