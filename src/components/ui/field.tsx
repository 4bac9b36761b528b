import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes, type TextareaHTMLAttributes } from "react";
import { cx } from "@/lib/cx";
import { ErrorIcon } from "./icons";

export const CONTROL_CLASSES = cx(
  "block w-full min-h-touch rounded-control border-2 border-line-strong bg-surface px-3 py-2 text-base text-ink",
  "placeholder:text-ink-muted aria-invalid:border-danger aria-invalid:bg-danger-soft",
);

/** The message under a field that is wrong; the icon and the words carry it, not the red. */
export function FieldError({ id, children }: { id: string; children: ReactNode }) {
  return (
    <p id={id} className="mt-1.5 flex items-start gap-1.5 font-bold text-danger">
      <ErrorIcon className="mt-0.5 size-5" />
      <span>{children}</span>
    </p>
  );
}

interface FieldFrameProps {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  className?: string;
  children: (ids: { inputId: string; describedBy: string | undefined; invalid: boolean }) => ReactNode;
}

/** Label, control, hint and error wired together by ids. */
export function FieldFrame({ label, hint, error, className, children }: FieldFrameProps) {
  const base = useId();
  const inputId = `${base}-input`;
  const hintId = hint ? `${base}-hint` : undefined;
  const errorId = error ? `${base}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(" ") || undefined;
  return (
    <div className={className}>
      <label htmlFor={inputId} className="mb-1.5 block font-bold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="-mt-1 mb-1.5 text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      {children({ inputId, describedBy, invalid: Boolean(error) })}
      {error && errorId ? <FieldError id={errorId}>{error}</FieldError> : null}
    </div>
  );
}

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "id"> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  wrapperClassName?: string;
  ref?: Ref<HTMLInputElement>;
}

export function TextField({ label, hint, error, wrapperClassName, className, ref, ...props }: TextFieldProps) {
  return (
    <FieldFrame label={label} hint={hint} error={error} className={wrapperClassName}>
      {({ inputId, describedBy, invalid }) => (
        <input
          ref={ref}
          id={inputId}
          aria-describedby={describedBy}
          aria-invalid={invalid || undefined}
          className={cx(CONTROL_CLASSES, className)}
          {...props}
        />
      )}
    </FieldFrame>
  );
}

interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, "id"> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  wrapperClassName?: string;
  ref?: Ref<HTMLTextAreaElement>;
}

export function TextAreaField({ label, hint, error, wrapperClassName, className, ref, ...props }: TextAreaFieldProps) {
  return (
    <FieldFrame label={label} hint={hint} error={error} className={wrapperClassName}>
      {({ inputId, describedBy, invalid }) => (
        <textarea
          ref={ref}
          id={inputId}
          aria-describedby={describedBy}
          aria-invalid={invalid || undefined}
          className={cx(CONTROL_CLASSES, "min-h-32 leading-relaxed", className)}
          {...props}
        />
      )}
    </FieldFrame>
  );
}

interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, "id"> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  wrapperClassName?: string;
}

export function SelectField({ label, hint, error, wrapperClassName, className, children, ...props }: SelectFieldProps) {
  return (
    <FieldFrame label={label} hint={hint} error={error} className={wrapperClassName}>
      {({ inputId, describedBy, invalid }) => (
        <select
          id={inputId}
          aria-describedby={describedBy}
          aria-invalid={invalid || undefined}
          className={cx(CONTROL_CLASSES, "cursor-pointer", className)}
          {...props}
        >
          {children}
        </select>
      )}
    </FieldFrame>
  );
}
