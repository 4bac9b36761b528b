import { useState } from "react";
import type { Invitation } from "@contracts/invitations";
import { STAFF_ROLE_LABELS } from "@contracts/staff-roles";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { ClockIcon, CloseIcon, ReloadIcon, WarnIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { SkeletonList } from "@/components/ui/skeleton";
import { errorMessage } from "@/lib/api-client";
import { useCancelInvitation } from "../api/cancel-invitation";
import { useInvitations } from "../api/get-invitations";
import { useResendInvitation } from "../api/resend-invitation";

const formatDay = (iso: string) => new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

/** Invitations waiting for the person to sign in, each with Resend and Cancel. */
export function InvitationList() {
  const invitations = useInvitations();
  const [message, setMessage] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);
  const [cancelling, setCancelling] = useState<Invitation | null>(null);
  const resend = useResendInvitation();
  const cancel = useCancelInvitation();

  if (invitations.isPending) return <SkeletonList rows={2} label="Loading invitations…" />;
  if (invitations.isError) {
    return (
      <ErrorState
        title="Could not load the invitations"
        error={invitations.error}
        onRetry={() => void invitations.refetch()}
        retrying={invitations.isFetching}
      />
    );
  }

  return (
    <div>
      <div aria-live="polite">
        {message ? (
          <Notice tone={message.tone} className="mb-4">
            <p>{message.text}</p>
          </Notice>
        ) : null}
      </div>
      {invitations.data.length === 0 ? (
        <EmptyState icon={<ClockIcon />} title="No invitations waiting">
          People you invite are listed here until they sign in.
        </EmptyState>
      ) : (
        <ul className="grid gap-3">
          {invitations.data.map((invitation) => (
            <li key={invitation.id} className="flex flex-wrap items-start justify-between gap-3 rounded-card border border-line p-4">
              <div className="min-w-0">
                <p className="font-bold">
                  {invitation.displayName}{" "}
                  {invitation.state === "expired" ? (
                    <Badge tone="warn" icon={<WarnIcon className="size-4" />}>
                      Link expired
                    </Badge>
                  ) : (
                    <Badge icon={<ClockIcon className="size-4" />}>Waiting</Badge>
                  )}
                </p>
                <p className="text-ink-muted [overflow-wrap:anywhere]">{invitation.email}</p>
                <p className="text-sm text-ink-muted">
                  {STAFF_ROLE_LABELS[invitation.role]}
                  {invitation.department ? ` · ${invitation.department.name}` : ""} ·{" "}
                  {invitation.lastSentAt ? `sent ${formatDay(invitation.lastSentAt)}` : "not sent yet"} ·{" "}
                  {invitation.state === "expired" ? "expired" : "link works until"} {formatDay(invitation.expiresAt)}
                </p>
              </div>
              <div className="flex flex-wrap gap-2">
                <Button
                  icon={<ReloadIcon />}
                  busy={resend.isPending && resend.variables === invitation.id}
                  aria-label={`Resend the invitation to ${invitation.email}`}
                  onClick={() => {
                    setMessage(null);
                    resend.mutate(invitation.id, {
                      onSuccess: (updated) =>
                        setMessage({ tone: "ok", text: `Sent a new link to ${updated.email}. The old link no longer works.` }),
                      onError: (error) => setMessage({ tone: "danger", text: errorMessage(error) }),
                    });
                  }}
                >
                  Resend
                </Button>
                <Button
                  variant="quiet"
                  icon={<CloseIcon />}
                  aria-label={`Cancel the invitation to ${invitation.email}`}
                  onClick={() => {
                    setMessage(null);
                    cancel.reset();
                    setCancelling(invitation);
                  }}
                >
                  Cancel
                </Button>
              </div>
            </li>
          ))}
        </ul>
      )}
      <ConfirmDialog
        open={cancelling !== null}
        onCancel={() => setCancelling(null)}
        onConfirm={() => {
          if (!cancelling || cancel.isPending) return;
          const email = cancelling.email;
          cancel.mutate(cancelling.id, {
            onSuccess: () => {
              setCancelling(null);
              setMessage({ tone: "ok", text: `Cancelled the invitation to ${email}. Its link no longer works.` });
            },
          });
        }}
        busy={cancel.isPending}
        tone="danger"
        title={cancelling ? `Cancel the invitation to ${cancelling.email}?` : "Cancel the invitation?"}
        confirmLabel="Cancel invitation"
        cancelLabel="Keep it"
        error={cancel.error}
      >
        <p>The link in the e-mail stops working. You can invite the same address again later.</p>
      </ConfirmDialog>
    </div>
  );
}
