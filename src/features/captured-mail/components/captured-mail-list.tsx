import { useId } from "react";
import type { CapturedMail } from "@contracts/captured-mail";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { ClockIcon, ReloadIcon } from "@/components/ui/icons";
import { SkeletonList } from "@/components/ui/skeleton";
import { useCapturedMail } from "../api/get-captured-mail";

const formatWhen = (iso: string) =>
  new Date(iso).toLocaleString("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", second: "2-digit" });

/** The captured messages, newest first, each with its plain-text body. */
export function CapturedMailList() {
  const query = useCapturedMail();
  const refresh = (
    <Button icon={<ReloadIcon />} onClick={() => void query.refetch()} busy={query.isFetching && !query.isPending}>
      Check for new messages
    </Button>
  );
  if (query.isPending) return <SkeletonList rows={2} label="Loading captured mail…" />;
  if (query.isError) {
    return <ErrorState title="Could not load the captured mail" error={query.error} onRetry={() => void query.refetch()} retrying={query.isFetching} />;
  }
  if (query.data.length === 0) {
    return (
      <EmptyState icon={<ClockIcon />} title="No messages yet" action={refresh}>
        Messages Linkleap sends, such as staff invitations, appear here.
      </EmptyState>
    );
  }
  return (
    <div className="grid gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-ink-muted">
          <span className="font-mono font-bold text-ink">{query.data.length}</span> {query.data.length === 1 ? "message" : "messages"}, newest first
        </p>
        {refresh}
      </div>
      <ol className="grid gap-4">
        {query.data.map((mail) => (
          <MailItem key={mail.id} mail={mail} />
        ))}
      </ol>
    </div>
  );
}

function MailItem({ mail }: { mail: CapturedMail }) {
  const id = useId();
  return (
    <li>
      <article aria-labelledby={id} className="rounded-card border border-line bg-surface shadow-card">
        <header className="border-b border-line px-4 py-3 sm:px-6">
          <h2 id={id} className="text-lg font-bold [overflow-wrap:anywhere]">
            {mail.subject || "(no subject)"}
          </h2>
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
            <dt className="font-bold text-ink-muted">From</dt>
            <dd className="[overflow-wrap:anywhere]">{mail.from}</dd>
            <dt className="font-bold text-ink-muted">To</dt>
            <dd className="[overflow-wrap:anywhere]">{mail.to.join(", ")}</dd>
            <dt className="font-bold text-ink-muted">Received</dt>
            <dd>
              <time dateTime={mail.receivedAt}>{formatWhen(mail.receivedAt)}</time>
            </dd>
          </dl>
        </header>
        <pre className="overflow-x-auto whitespace-pre-wrap px-4 py-3 font-mono text-sm [overflow-wrap:anywhere] sm:px-6">{mail.text}</pre>
      </article>
    </li>
  );
}
