import { useState } from "react";
import type { ClassSummary } from "@contracts/classes";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { ArchiveIcon, RestoreIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { Section } from "@/components/ui/section";
import { useSetClassArchived } from "../api/set-class-archived";

/** Archive a class that has finished (kept, out of the way) or bring an archived one back. */
export function ArchiveClassSection({ item }: { item: ClassSummary }) {
  const archived = Boolean(item.archivedAt);
  const [confirming, setConfirming] = useState(false);
  const [done, setDone] = useState<string | null>(null);
  const mutation = useSetClassArchived();

  const confirm = () => {
    if (mutation.isPending) return;
    mutation.mutate(
      { classId: item.id, archived: !archived },
      {
        onSuccess: (updated) => {
          setConfirming(false);
          setDone(updated.archivedAt ? "Class archived." : "Class restored.");
        },
      },
    );
  };

  return (
    <Section
      title={archived ? "Restore class" : "Archive class"}
      description={
        archived
          ? "This class is archived. Restoring it puts it back with your current classes."
          : "When a class has finished, archive it. It leaves your current classes; its details and roster are kept, and you can restore it at any time."
      }
    >
      <Button
        variant={archived ? "primary" : "secondary"}
        icon={archived ? <RestoreIcon /> : <ArchiveIcon />}
        onClick={() => {
          mutation.reset();
          setDone(null);
          setConfirming(true);
        }}
      >
        {archived ? "Restore class" : "Archive class"}
      </Button>
      {done ? (
        <Notice tone="ok" live="status" className="mt-4">
          <p>{done}</p>
        </Notice>
      ) : null}
      <ConfirmDialog
        open={confirming}
        onCancel={() => setConfirming(false)}
        onConfirm={confirm}
        busy={mutation.isPending}
        title={archived ? `Restore ${item.name}?` : `Archive ${item.name}?`}
        confirmLabel={archived ? "Restore class" : "Archive class"}
        error={mutation.error}
      >
        <p>
          {archived
            ? "It goes back to your current classes, with its details and roster as they are."
            : "It leaves your current classes. Its details and roster are kept, and you can restore it from the archived classes at any time."}
        </p>
      </ConfirmDialog>
    </Section>
  );
}
