import { Link, Navigate, Outlet, useLocation } from "react-router";
import { ErrorState } from "@/components/ui/error-state";
import { LoadingState } from "@/components/ui/spinner";
import { useSession } from "@/features/auth/api/get-session";
import type { AppNavigationState } from "@/lib/navigation-state";
import { signInPath } from "@/lib/return-to";
import { AppHeader } from "./app-header";

/**
 * The signed-in part of Linkleap. Waits for the session; someone signed out is sent to sign in
 * and brought back here afterwards.
 */
export function AppShell() {
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

  return (
    <div className="flex min-h-dvh flex-col">
      <AppHeader me={me} demo={session.data.demo} />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-page flex-1 px-4 py-6 focus:outline-none sm:px-6 sm:py-10">
        <Outlet />
      </main>
      <footer className="border-t border-line px-4 py-2 text-center text-sm text-ink-muted">
        Linkleap · {me.school.name} ·{" "}
        <Link to="/privacy" className="inline-flex min-h-touch items-center px-1 text-accent">
          Pupil data and privacy
        </Link>
      </footer>
    </div>
  );
}
