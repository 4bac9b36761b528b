import type { ButtonHTMLAttributes, ReactNode, Ref } from "react";
import { Link, type LinkProps } from "react-router";
import { cx } from "@/lib/cx";
import { ReloadIcon } from "./icons";
import { Spinner } from "./spinner";

export const BUTTON_VARIANTS = {
  primary: "bg-accent text-on-accent border-accent hover:bg-accent-strong hover:border-accent-strong",
  secondary: "bg-surface text-ink border-line-strong hover:bg-sunken",
  danger: "bg-danger text-on-accent border-danger hover:bg-danger-strong hover:border-danger-strong",
  quiet: "bg-transparent text-accent border-transparent hover:bg-accent-soft",
} as const;
export type ButtonVariant = keyof typeof BUTTON_VARIANTS;

export const BUTTON_SIZES = {
  md: "min-h-touch px-4 text-base gap-2",
  lg: "min-h-14 px-6 text-lg gap-3",
} as const;
export type ButtonSize = keyof typeof BUTTON_SIZES;

/** Classes for anything that looks like a button (buttons, links, file pickers). */
export function buttonClasses(variant: ButtonVariant = "secondary", size: ButtonSize = "md", extra?: string) {
  return cx(
    "inline-flex items-center justify-center rounded-control border-2 font-bold leading-tight no-underline",
    "transition-colors select-none cursor-pointer disabled:cursor-not-allowed disabled:opacity-60",
    "aria-disabled:cursor-not-allowed aria-disabled:opacity-60",
    BUTTON_VARIANTS[variant],
    BUTTON_SIZES[size],
    extra,
  );
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  icon?: ReactNode;
  /** Shows a spinner and ignores clicks while an action runs; the label stays readable. */
  busy?: boolean;
  ref?: Ref<HTMLButtonElement>;
}

export function Button({ variant, size, icon, busy = false, className, children, type = "button", onClick, ...props }: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      aria-disabled={busy || undefined}
      onClick={(event) => {
        // aria-disabled keeps the button focusable (focus is not lost mid-action); block the action instead.
        if (busy) {
          event.preventDefault();
          return;
        }
        onClick?.(event);
      }}
      {...props}
    >
      {busy ? <Spinner className="size-5" /> : icon}
      {children}
    </button>
  );
}

interface ButtonLinkProps extends LinkProps {
  variant?: ButtonVariant;
  size?: ButtonSize;
  icon?: ReactNode;
}

export function ButtonLink({ variant, size, icon, className, children, ...props }: ButtonLinkProps) {
  return (
    <Link className={buttonClasses(variant, size, typeof className === "string" ? className : undefined)} {...props}>
      {icon}
      {children}
    </Link>
  );
}

/** The one way out of an out-of-date or half-loaded page: load it again. */
export function ReloadPageButton({ variant = "primary" }: { variant?: ButtonProps["variant"] }) {
  return (
    <Button variant={variant} icon={<ReloadIcon />} onClick={() => window.location.reload()}>
      Reload the page
    </Button>
  );
}
