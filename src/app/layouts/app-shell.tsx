import { Link, Outlet } from "react-router";
import { AppHeader } from "./app-header";
import { RequireSignIn } from "./require-sign-in";

/**
 * The signed-in part of Linkleap. Waits for the session; someone signed out is sent to sign in
 * and brought back here afterwards.
 */
export function AppShell() {
  return (
    <RequireSignIn>
      {(me, demo) => (
        <div className="flex min-h-dvh flex-col">
          <AppHeader me={me} demo={demo} />
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
      )}
    </RequireSignIn>
  );
}

/** Signed in, without the header and footer: the full-screen lesson board and the remote. */
export function BareSignedInLayout() {
  return <RequireSignIn>{() => <Outlet />}</RequireSignIn>;
}
