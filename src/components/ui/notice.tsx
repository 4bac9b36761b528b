import type { ReactNode } from "react";
import { cx } from "@/lib/cx";
import { CheckCircleIcon, ErrorIcon, InfoIcon, WarnIcon } from "./icons";

const TONES = {
  info: { box: "bg-accent-soft border-accent text-ink", icon: InfoIcon, iconClass: "text-accent", word: "Note" },
  ok: { box: "bg-ok-soft border-ok text-ink", icon: CheckCircleIcon, iconClass: "text-ok", word: "Done" },
  warn: { box: "bg-warn-soft border-warn text-ink", icon: WarnIcon, iconClass: "text-warn", word: "Take care" },
  danger: { box: "bg-danger-soft border-danger text-ink", icon: ErrorIcon, iconClass: "text-danger", word: "Problem" },
} as const;
export type NoticeTone = keyof typeof TONES;

interface NoticeProps {
  tone: NoticeTone;
  title?: ReactNode;
  children?: ReactNode;
  actions?: ReactNode;
  /** `alert` interrupts (errors after an action); `status` waits its turn; none for static text. */
  live?: "alert" | "status";
  className?: string;
  id?: string;
}

/**
 * A boxed message. The tone shows as colour, as an icon of its own shape and as a hidden word,
 * so it never depends on colour alone.
 */
export function Notice({ tone, title, children, actions, live, className, id }: NoticeProps) {
  const t = TONES[tone];
  const Icon = t.icon;
  return (
    <div
      id={id}
      role={live}
      className={cx("flex gap-3 rounded-control border-l-4 border-y border-r px-4 py-3", t.box, className)}
    >
      <Icon className={cx("mt-0.5 size-6", t.iconClass)} />
      <div className="min-w-0 flex-1">
        <span className="sr-only">{t.word}: </span>
        {title ? <p className="font-bold">{title}</p> : null}
        {children ? <div className={title ? "mt-1" : undefined}>{children}</div> : null}
        {actions ? <div className="mt-3 flex flex-wrap gap-3">{actions}</div> : null}
      </div>
    </div>
  );
}

/**
 * A form's own error after a submit: announced at once, and focusable so `useFocusFirstError`
 * can move keyboard and screen-reader users to it.
 */
export function FormErrorNotice({ children, className }: { children: ReactNode; className?: string }) {
  return (
    <Notice tone="danger" live="alert" className={className}>
      <p data-form-error tabIndex={-1}>
        {children}
      </p>
    </Notice>
  );
}
