import type { ReactNode } from "react";
import { Navigate, useLocation } from "react-router";
import type { Me } from "@contracts/staff";
import { ErrorState } from "@/components/ui/error-state";
import { LoadingState } from "@/components/ui/spinner";
import { useSession } from "@/features/auth/api/get-session";
import type { AppNavigationState } from "@/lib/navigation-state";
import { signInPath } from "@/lib/return-to";

/**
 * Waits for the session and shows `children` only to someone signed in; anyone else is sent to
 * sign in and brought back here afterwards. Used by the app shell and by the full-screen pages
 * (the lesson board and remote) that have no header.
 */
export function RequireSignIn({ children }: { children: (me: Me, demo: boolean) => ReactNode }) {
  const session = useSession();
  const location = useLocation();

  if (session.isPending) {
    return (
      <main id="main" tabIndex={-1} className="mx-auto max-w-page px-4 py-10 sm:px-6">
        <LoadingState label="Checking your sign-in…" />
      </main>
    );
  }
  if (session.isError && !session.data) {
    return (
      <main id="main" tabIndex={-1} className="mx-auto max-w-prose px-4 py-10">
        <h1 className="mb-4 text-3xl font-bold">Linkleap</h1>
        <ErrorState
          title="Could not check your sign-in"
          error={session.error}
          onRetry={() => void session.refetch()}
          retrying={session.isFetching}
        />
      </main>
    );
  }
  const me = session.data.user;
  if (!me) {
    const state: AppNavigationState = { leaveUnsaved: true };
    return <Navigate to={signInPath(`${location.pathname}${location.search}`)} replace state={state} />;
  }
  return <>{children(me, session.data.demo)}</>;
}
