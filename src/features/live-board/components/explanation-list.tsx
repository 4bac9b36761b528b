import { useState } from "react";
import type { TeacherExplanation } from "@contracts/lessons";
import { Button } from "@/components/ui/button";
import { CheckCircleIcon } from "@/components/ui/icons";
import { errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import type { Send } from "../api/use-teacher-lesson";

/**
 * Pupils' explanations for the teacher to choose from, each with Show / Hide on the board.
 * Names appear only when `withNames` (the remote, or the board with names turned on).
 */
export function ExplanationList({ explanations, withNames, send, className }: {
  explanations: readonly TeacherExplanation[];
  withNames: boolean;
  send: Send;
  className?: string;
}) {
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<{ id: string; error: unknown } | null>(null);
  if (explanations.length === 0) return <p className={cx("text-ink-muted", className)}>No explanations yet.</p>;
  return (
    <ul className={cx("grid gap-3", className)} aria-label="Pupils’ explanations">
      {explanations.map((x) => (
        <li key={x.id} className={cx("rounded-control border-2 p-3", x.shown ? "border-accent" : "border-line")}>
          {withNames ? <p className="text-sm font-bold text-ink-muted">{x.participantName}</p> : null}
          <p className="whitespace-pre-wrap">{x.text}</p>
          <div className="mt-2 flex flex-wrap items-center gap-3">
            {x.shown ? (
              <span className="flex items-center gap-1 font-bold text-accent">
                <CheckCircleIcon className="size-5" /> On the board
              </span>
            ) : null}
            <Button
              busy={busy === x.id}
              onClick={() => {
                setBusy(x.id);
                setError(null);
                send("explanation:show", { explanationId: x.id, shown: !x.shown })
                  .catch((e: unknown) => setError({ id: x.id, error: e }))
                  .finally(() => setBusy(null));
              }}
            >
              {x.shown ? "Hide from the board" : "Show on the board"}
            </Button>
          </div>
          {error?.id === x.id ? <p role="alert" className="mt-1 font-bold text-danger">{errorMessage(error.error)}</p> : null}
        </li>
      ))}
    </ul>
  );
}
