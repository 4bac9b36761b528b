import type { SessionInfo } from "@contracts/session";
import { buttonClasses } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { SIGNED_OUT_MESSAGES, type SignedOutReason } from "@/lib/navigation-state";
import { signInStartUrl } from "@/lib/return-to";

const NOTICE_TEXT = {
  sign_in_cancelled: "Sign-in was cancelled. You can try again whenever you are ready.",
  sign_in_failed: "Sign-in did not work this time. Please try again; if it keeps failing, ask your school admin.",
} as const;

const INVITATION_CLOSED_TEXT = {
  used: "This invitation has already been used. If it was you, just sign in with your school account.",
  cancelled: "This invitation was cancelled. Ask your school admin if you should still have access.",
  expired: "This invitation has run out. Ask your school admin to send you a new one.",
  unknown: "This invitation link does not work: it may have been replaced by a newer one. Use the link in the latest e-mail, or ask your school admin to send it again.",
} as const;

/**
 * The one way in: a big link to the school's sign-in. Shows why the person is here
 * (signed out elsewhere, sign-in cancelled…) and, in the demo, how the local sign-in works.
 */
export function SignInPanel({ session, sessionError, onRetrySession, retrying, returnTo, signedOut }: {
  session: SessionInfo | undefined;
  sessionError: unknown;
  onRetrySession: () => void;
  retrying: boolean;
  returnTo: string | null;
  signedOut: SignedOutReason | undefined;
}) {
  const notice = session?.notice ?? null;
  return (
    <div>
      <h1 tabIndex={-1} className="text-4xl font-bold focus:outline-none">
        Sign in to Linkleap
      </h1>
      <p className="mt-3 text-lg text-ink-muted">
        Linkleap is a live classroom board for teaching the mechanics of chains, for physics teachers and their classes.
      </p>

      <div className="grid gap-3 [&:not(:empty)]:mt-6" aria-live="polite">
        {signedOut && !notice ? (
          <Notice tone="info">
            <p className="font-bold">{SIGNED_OUT_MESSAGES[signedOut]}</p>
          </Notice>
        ) : null}
        {notice?.kind === "sign_in_cancelled" || notice?.kind === "sign_in_failed" ? (
          <Notice tone={notice.kind === "sign_in_failed" ? "danger" : "info"}>
            <p>{NOTICE_TEXT[notice.kind]}</p>
          </Notice>
        ) : null}
        {notice?.kind === "not_invited" ? (
          <Notice tone="warn" title="That account has not been invited">
            <p>
              You signed in as <strong className="break-all">{notice.email}</strong>, which is not on your school’s staff list.
              Ask your head of department or school admin to invite you, or sign in with another account.
            </p>
          </Notice>
        ) : null}
        {notice?.kind === "invitation_closed" ? (
          <Notice tone="warn" title="This invitation cannot be used">
            <p>{INVITATION_CLOSED_TEXT[notice.reason]}</p>
          </Notice>
        ) : null}
        {notice?.kind === "invitation_other_account" ? (
          <Notice tone="warn" title="Sign in with the invited address">
            <p>
              You signed in as <strong className="break-all">{notice.email}</strong>, but the invitation was sent to another
              address. Open the link in the e-mail again and sign in with the address it was sent to.
            </p>
          </Notice>
        ) : null}
        {sessionError ? (
          <ErrorState title="Could not check whether you are signed in" error={sessionError} onRetry={onRetrySession} retrying={retrying} />
        ) : null}
      </div>

      <a href={signInStartUrl(returnTo)} className={buttonClasses("primary", "lg", "mt-8 w-full")}>
        Sign in with your school account
      </a>

      {session?.demo ? (
        <p className="mt-5 rounded-control bg-sunken px-4 py-3 text-ink-muted">
          <strong className="text-ink">Demo:</strong> signing in opens a local sign-in page where you pick one of the demo
          school’s accounts. No real accounts are used.
        </p>
      ) : null}
      {!session && !sessionError ? (
        <p role="status" className="mt-5 flex items-center gap-2 text-ink-muted">
          <Spinner className="size-5" /> Checking whether you are already signed in…
        </p>
      ) : null}
    </div>
  );
}
