import { ReloadPageButton } from "@/components/ui/button";
import { CheckCircleIcon, ErrorIcon, ReloadIcon, WarnIcon } from "@/components/ui/icons";
import { cx } from "@/lib/cx";
import type { LessonConnection } from "../api/use-teacher-lesson";

const TEXT: Record<LessonConnection, { words: string; tone: "ok" | "warn" | "danger" }> = {
  connecting: { words: "Connecting…", tone: "warn" },
  live: { words: "Connected", tone: "ok" },
  reconnecting: { words: "Connection lost, reconnecting… (answers are kept on pupils’ devices)", tone: "warn" },
  outdated: { words: "This page is out of date: reload it to keep going.", tone: "danger" },
  refused: { words: "This lesson cannot be shown here.", tone: "danger" },
  unavailable: { words: "Could not load the connection code: check the network and reload.", tone: "danger" },
};

/** One line saying whether the board or remote is connected; words and an icon, not colour alone. */
export function ConnectionStatus({ connection, className }: { connection: LessonConnection; className?: string }) {
  const { words, tone } = TEXT[connection];
  const Icon = tone === "ok" ? CheckCircleIcon : tone === "warn" ? (connection === "reconnecting" ? ReloadIcon : WarnIcon) : ErrorIcon;
  return (
    <p role="status" className={cx("flex flex-wrap items-center gap-2 text-sm", tone === "ok" ? "text-ink-muted" : tone === "warn" ? "text-warn" : "text-danger", className)}>
      <Icon className="size-4" />
      <span>{words}</span>
      {connection === "outdated" ? <ReloadPageButton variant="secondary" /> : null}
    </p>
  );
}
