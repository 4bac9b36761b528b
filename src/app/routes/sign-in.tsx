import { Navigate, useLocation, useSearchParams } from "react-router";
import { useSession } from "@/features/auth/api/get-session";
import { SignInLayout } from "@/features/auth/components/sign-in-layout";
import { SignInPanel } from "@/features/auth/components/sign-in-panel";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { readNavigationState } from "@/lib/navigation-state";
import { safeReturnTo } from "@/lib/return-to";

export function Component() {
  useDocumentTitle("Sign in");
  const session = useSession();
  const [params] = useSearchParams();
  const location = useLocation();
  const returnTo = safeReturnTo(params.get("returnTo")) ?? null;

  // Already signed in (a second tab, the back button): go on to where they were heading.
  if (session.data?.user) return <Navigate to={returnTo ?? "/"} replace />;

  return (
    <SignInLayout>
      <SignInPanel
        session={session.data}
        sessionError={session.isError ? session.error : null}
        onRetrySession={() => void session.refetch()}
        retrying={session.isFetching}
        returnTo={returnTo}
        signedOut={readNavigationState(location.state).signedOut}
      />
    </SignInLayout>
  );
}
