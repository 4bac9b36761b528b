import type { Blocker } from "react-router";
import { ConfirmDialog } from "./dialog";

/** Shown while the router holds a navigation away from unsaved changes. */
export function UnsavedChangesDialog({ blocker }: { blocker: Blocker }) {
  return (
    <ConfirmDialog
      open={blocker.state === "blocked"}
      onCancel={() => blocker.reset?.()}
      onConfirm={() => blocker.proceed?.()}
      title="Leave without saving?"
      confirmLabel="Leave without saving"
      cancelLabel="Stay on this page"
      tone="danger"
    >
      <p>You have changes on this page that are not saved yet. If you leave now, they will be lost.</p>
    </ConfirmDialog>
  );
}
