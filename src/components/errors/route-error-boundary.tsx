import { isRouteErrorResponse, useLocation, useNavigate, useRouteError } from "react-router";
import { Button, ButtonLink, ReloadPageButton } from "@/components/ui/button";
import { ReloadIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { isApiError } from "@/lib/api-client";

/** A page's code failed to download: usually a dropped connection, or Linkleap was updated meanwhile. */
function isChunkLoadError(error: unknown) {
  return (
    error instanceof Error &&
    /dynamically imported module|Importing a module script failed|error loading dynamically imported|Unable to preload CSS/i.test(error.message)
  );
}

function describe(error: unknown): { title: string; message: string } {
  if (isRouteErrorResponse(error) && error.status === 404) {
    return { title: "Page not found", message: "There is nothing at this address." };
  }
  if (isChunkLoadError(error)) {
    return {
      title: "This page could not be loaded",
      message: "The connection may have dropped, or Linkleap has just been updated. Try again, or reload the page.",
    };
  }
  if (isApiError(error)) return { title: "This page could not be shown", message: error.message };
  return { title: "Something went wrong on this page", message: "The rest of Linkleap still works. Try again, or reload the page." };
}

/**
 * Error boundary for one section of the route tree: the header and navigation around it keep
 * working, and "Try again" re-enters the same address (which also retries loading the page's code).
 */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const navigate = useNavigate();
  const location = useLocation();
  const { title, message } = describe(error);
  if (import.meta.env.DEV) console.error(error);

  return (
    <div className="mx-auto max-w-prose py-6">
      <Notice
        tone="danger"
        live="alert"
        title={title}
        actions={
          <>
            <Button
              variant="primary"
              icon={<ReloadIcon />}
              onClick={() => void navigate(`${location.pathname}${location.search}`, { replace: true })}
            >
              Try again
            </Button>
            <ReloadPageButton variant="secondary" />
            <ButtonLink to="/" variant="quiet">
              Go to the home page
            </ButtonLink>
          </>
        }
      >
        <p>{message}</p>
      </Notice>
    </div>
  );
}
