import { Navigate } from "react-router";
import { LoadingState } from "@/components/ui/spinner";
import { useSession } from "@/features/auth/api/get-session";
import { NotInvitedPanel } from "@/features/auth/components/not-invited-panel";
import { SignInLayout } from "@/features/auth/components/sign-in-layout";
import { useDocumentTitle } from "@/hooks/use-document-title";

export function Component() {
  useDocumentTitle("Not invited yet");
  const session = useSession();
  if (session.data?.user) return <Navigate to="/" replace />;
  const notice = session.data?.notice;
  return (
    <SignInLayout>
      {session.isPending ? (
        <LoadingState label="Loading…" />
      ) : (
        // Without the notice (the page was opened directly, or the session expired) the page still explains itself.
        <NotInvitedPanel email={notice?.kind === "not_invited" ? notice.email : null} />
      )}
    </SignInLayout>
  );
}
