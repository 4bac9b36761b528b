import type { ReactNode } from "react";
import { cx } from "@/lib/cx";

const TONES = {
  neutral: "bg-sunken text-ink border-line-strong",
  accent: "bg-accent-soft text-accent border-accent",
  warn: "bg-warn-soft text-warn border-warn",
} as const;

/** A small label; the icon and word carry the meaning, the colour only helps. */
export function Badge({ icon, children, tone = "neutral", className }: {
  icon?: ReactNode;
  children: ReactNode;
  tone?: keyof typeof TONES;
  className?: string;
}) {
  return (
    <span className={cx("inline-flex items-center gap-1 rounded-full border px-2.5 py-0.5 text-sm font-bold", TONES[tone], className)}>
      {icon}
      {children}
    </span>
  );
}
