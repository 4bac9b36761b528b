import { useState } from "react";
import type { PupilDataDeletion } from "@contracts/retention";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { RemoveIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { useDeleteClassPupilData } from "../api/delete-class-pupil-data";
import { deletedSummary } from "../utils/deleted-summary";

/**
 * "Delete this class's pupil data now", with a confirmation that says what goes and that it
 * cannot be undone. The class itself stays.
 */
export function DeletePupilDataButton({ classId, className, rosterCount, onDeleted }: {
  classId: string;
  className: string;
  rosterCount: number;
  onDeleted?: (result: PupilDataDeletion) => void;
}) {
  const [confirming, setConfirming] = useState(false);
  const [done, setDone] = useState<string | null>(null);
  const mutation = useDeleteClassPupilData();

  return (
    <div>
      <Button
        variant="danger"
        icon={<RemoveIcon />}
        aria-label={`Delete the pupil data of ${className} now`}
        onClick={() => {
          mutation.reset();
          setDone(null);
          setConfirming(true);
        }}
      >
        Delete pupil data now
      </Button>
      <div aria-live="polite">
        {done ? (
          <Notice tone="ok" className="mt-3">
            <p>{done}</p>
          </Notice>
        ) : null}
      </div>
      <ConfirmDialog
        open={confirming}
        onCancel={() => setConfirming(false)}
        onConfirm={() => {
          if (mutation.isPending) return;
          mutation.mutate(classId, {
            onSuccess: (result) => {
              setConfirming(false);
              setDone(`Deleted ${deletedSummary(result.deleted)} from ${className}.`);
              onDeleted?.(result);
            },
          });
        }}
        busy={mutation.isPending}
        tone="danger"
        title={`Delete the pupil data of ${className}?`}
        confirmLabel="Delete pupil data"
        error={mutation.error}
      >
        <p>
          This deletes, straight away, the class’s roster ({rosterCount} {rosterCount === 1 ? "name" : "names"}), the names,
          predictions, reasons and explanations from all its lessons, and its photos of real runs. It cannot be undone. The
          class itself, its settings, its lessons’ set-ups and results, and the numbers measured on photos stay.
        </p>
        <p className="text-ink-muted">The deletion is written to the school’s audit log, without any pupil names.</p>
      </ConfirmDialog>
    </div>
  );
}
