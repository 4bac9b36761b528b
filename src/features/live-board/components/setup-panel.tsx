import { useState } from "react";
import type { TeacherTrial } from "@contracts/lessons";
import { SetupFields } from "@/components/trial-setup/setup-fields";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import type { Send } from "../api/use-teacher-lesson";
import type { SetupDraftHandle } from "../hooks/use-setup-draft";

/**
 * The trial's set-up: rig, chain, parameters and question. Editable only while setting up;
 * afterwards the set-up is fixed (answers belong to it) and "Change and run again" starts a
 * copy as a new trial.
 */
export function SetupPanel({ trial, lessonId, setup, send, className }: {
  trial: TeacherTrial;
  lessonId: string;
  setup: SetupDraftHandle;
  send: Send;
  className?: string;
}) {
  const [copying, setCopying] = useState(false);
  const [copyError, setCopyError] = useState<unknown>(null);

  if (!setup.editable) {
    const again = async () => {
      setCopying(true);
      setCopyError(null);
      try {
        const { trialId } = await send("trial:add", { lessonId, copyOf: trial.id });
        await send("trial:show", { lessonId, trialId });
      } catch (error) {
        setCopyError(error);
      } finally {
        setCopying(false);
      }
    };
    return (
      <section aria-labelledby="setup-title" className={cx("grid gap-3", className)}>
        <h2 id="setup-title" className="text-xl font-bold">Set-up (fixed)</h2>
        <p className="text-ink-muted">Pupils have answered for this set-up, so it stays as it is. To try a change, run it as a new trial.</p>
        <ul className="grid gap-1">
          {trial.shownParams.map((p) => (
            <li key={p.key}>
              {p.label}: <span className="font-mono font-bold">{p.value}{p.unit ? ` ${p.unit}` : ""}</span>
            </li>
          ))}
        </ul>
        <Button variant="primary" busy={copying} onClick={() => void again()}>
          Change and run again
        </Button>
        {copyError ? (
          <Notice tone="danger" live="alert">
            <p>{errorMessage(copyError)}</p>
          </Notice>
        ) : null}
      </section>
    );
  }

  return (
    <section aria-labelledby="setup-title" className={cx("grid gap-4", className)}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="setup-title" className="text-xl font-bold">Set-up</h2>
        <p role="status" className="text-sm text-ink-muted">
          {setup.status === "saving" ? "Saving…" : setup.status === "failed" ? "Not saved: see the messages below" : "Saved"}
        </p>
      </div>
      {setup.problem ? (
        <Notice tone="danger" live="alert">
          <p>{setup.problem}</p>
        </Notice>
      ) : null}
      <SetupFields draft={setup.draft} change={setup.change} errors={setup.errors} />
    </section>
  );
}
