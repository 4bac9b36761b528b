import { Outlet, ScrollRestoration } from "react-router";
import { SkipLink } from "@/components/layout/skip-link";
import { ReloadPageButton } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useSession } from "@/features/auth/api/get-session";
import { useSessionSocket } from "@/features/auth/hooks/use-session-socket";
import { useRouteFocus } from "@/hooks/use-route-focus";

/** Wraps every page: the skip link, the session socket, and the "reload, this page is out of date" banner. */
export function RootLayout() {
  const session = useSession();
  const socketStatus = useSessionSocket(session.data?.user?.id);
  useRouteFocus();

  return (
    <>
      <SkipLink />
      {socketStatus === "outdated" ? (
        <div className="px-4 pt-3">
          <Notice
            tone="warn"
            live="alert"
            className="mx-auto max-w-page"
            title="This page is out of date"
            actions={
              <ReloadPageButton />
            }
          >
            <p>Linkleap has been updated since this page was opened. Reload it to keep working; nothing you have saved is lost.</p>
          </Notice>
        </div>
      ) : null}
      <Outlet />
      <ScrollRestoration />
    </>
  );
}
