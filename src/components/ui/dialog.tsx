import { useEffect, useId, useRef, type ReactNode } from "react";
import { errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import { Button } from "./button";
import { CloseIcon } from "./icons";
import { Notice } from "./notice";

interface DialogProps {
  open: boolean;
  /** Called for Escape and the close button; the parent decides whether to close. */
  onClose: () => void;
  title: ReactNode;
  description?: ReactNode;
  children: ReactNode;
  className?: string;
}

const FOCUSABLE = 'input:not([disabled]), select:not([disabled]), textarea:not([disabled]), button:not([disabled]), a[href]';

/**
 * A modal built on the native <dialog>: the browser keeps focus inside and makes the page
 * behind inert. Focus goes to the element marked `data-autofocus` (or the first field) when it
 * opens, and back to whatever opened it when it closes. Escape closes it.
 */
export function Dialog({ open, onClose, title, description, children, className }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const returnFocusTo = useRef<HTMLElement | null>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) {
      returnFocusTo.current = document.activeElement instanceof HTMLElement ? document.activeElement : null;
      dialog.showModal();
      const body = dialog.querySelector<HTMLElement>("[data-dialog-body]");
      const target = dialog.querySelector<HTMLElement>("[data-autofocus]") ?? body?.querySelector<HTMLElement>(FOCUSABLE);
      target?.focus();
    } else if (!open && dialog.open) {
      dialog.close();
    }
  }, [open]);

  // Put focus back when the dialog goes away, including when it unmounts while open.
  useEffect(() => {
    if (!open) return;
    return () => {
      const target = returnFocusTo.current;
      if (target?.isConnected) requestAnimationFrame(() => target.focus());
    };
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className={cx(
        "m-auto w-[min(36rem,calc(100vw-1.5rem))] max-h-[calc(100dvh-1.5rem)] overflow-y-auto rounded-card border border-line bg-surface p-0 text-ink shadow-lifted",
        className,
      )}
    >
      {open ? (
        <div className="p-5 sm:p-6">
          <div className="flex items-start justify-between gap-4">
            <h2 id={titleId} className="pt-1.5 text-xl font-bold">
              {title}
            </h2>
            <Button variant="quiet" className="min-w-touch px-0" onClick={onClose} aria-label="Close">
              <CloseIcon />
            </Button>
          </div>
          {description ? (
            <div id={descriptionId} className="mt-2 text-ink-muted">
              {description}
            </div>
          ) : null}
          <div data-dialog-body className="mt-5">
            {children}
          </div>
        </div>
      ) : null}
    </dialog>
  );
}

interface ConfirmDialogProps {
  open: boolean;
  onCancel: () => void;
  onConfirm: () => void;
  title: ReactNode;
  children?: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  tone?: "primary" | "danger";
  busy?: boolean;
  /** Why the confirmed action failed (e.g. a mutation's error), shown inside the dialog. */
  error?: unknown;
}

/** Asks before something with consequences. The safe choice has focus first. */
export function ConfirmDialog({
  open,
  onCancel,
  onConfirm,
  title,
  children,
  confirmLabel,
  cancelLabel = "Cancel",
  tone = "primary",
  busy = false,
  error,
}: ConfirmDialogProps) {
  return (
    <Dialog open={open} onClose={onCancel} title={title}>
      {children ? <div className="grid gap-3">{children}</div> : null}
      {error ? (
        <Notice tone="danger" live="alert" className="mt-4">
          <p>{errorMessage(error)}</p>
        </Notice>
      ) : null}
      <div className="mt-6 flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">
        <Button data-autofocus onClick={onCancel}>
          {cancelLabel}
        </Button>
        <Button variant={tone} onClick={onConfirm} busy={busy}>
          {confirmLabel}
        </Button>
      </div>
    </Dialog>
  );
}
