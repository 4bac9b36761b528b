import { ButtonLink, buttonClasses } from "@/components/ui/button";
import { WarnIcon } from "@/components/ui/icons";
import { signInStartUrl } from "@/lib/return-to";

/** Someone signed in with an account the school has not invited. */
export function NotInvitedPanel({ email }: { email: string | null }) {
  return (
    <div>
      <div className="mb-4 flex size-12 items-center justify-center rounded-full bg-warn-soft text-warn">
        <WarnIcon className="size-7" />
      </div>
      <h1 tabIndex={-1} className="text-3xl font-bold focus:outline-none sm:text-4xl">
        Ask your department to invite you
      </h1>
      {email ? (
        <p className="mt-4 text-lg">
          You signed in as <strong className="break-all">{email}</strong>. That address is not on your school’s Linkleap staff list yet.
        </p>
      ) : (
        <p className="mt-4 text-lg">The account you signed in with is not on your school’s Linkleap staff list yet.</p>
      )}
      <p className="mt-3 text-ink-muted">
        Linkleap lets in only staff whom their school has invited. Ask your head of department or your school admin to invite
        {email ? " this address" : " the address you use at school"}, then sign in again. If you have another school account,
        you can try that one instead.
      </p>
      <div className="mt-8 flex flex-col gap-3 sm:flex-row">
        <a href={signInStartUrl()} className={buttonClasses("primary", "lg")}>
          Try another account
        </a>
        <ButtonLink to="/sign-in" size="lg" variant="quiet">
          Back to sign-in
        </ButtonLink>
      </div>
    </div>
  );
}
