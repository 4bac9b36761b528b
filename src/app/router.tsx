import { createBrowserRouter } from "react-router";
import { RouteErrorBoundary } from "@/components/errors/route-error-boundary";
import { LoadingState } from "@/components/ui/spinner";
import { AppShell, BareSignedInLayout } from "./layouts/app-shell";
import { lazyPage } from "./lazy-page";
import { RootLayout } from "./layouts/root-layout";

/**
 * Every page is its own chunk (route `lazy`), so the first load carries only the shell.
 * Each page has its own error boundary: a failure there leaves the header and navigation working.
 */
export function createRouter() {
  return createBrowserRouter([
    {
      Component: RootLayout,
      ErrorBoundary: RouteErrorBoundary,
      // Shown while the first page's code arrives.
      HydrateFallback: () => <LoadingState label="Loading Linkleap…" className="justify-center py-24" />,
      children: [
        { path: "sign-in", lazy: lazyPage(() => import("./routes/sign-in")), ErrorBoundary: RouteErrorBoundary },
        { path: "sign-in/not-invited", lazy: lazyPage(() => import("./routes/not-invited")), ErrorBoundary: RouteErrorBoundary },
        {
          // Full screen, signed in, no header: the board on the projector and the teacher's remote.
          Component: BareSignedInLayout,
          ErrorBoundary: RouteErrorBoundary,
          children: [
            { path: "lessons/:lessonId/board", lazy: lazyPage(() => import("./routes/lesson-board")), ErrorBoundary: RouteErrorBoundary },
            { path: "lessons/:lessonId/remote", lazy: lazyPage(() => import("./routes/lesson-remote")), ErrorBoundary: RouteErrorBoundary },
          ],
        },
        {
          Component: AppShell,
          ErrorBoundary: RouteErrorBoundary,
          children: [
            { index: true, lazy: lazyPage(() => import("./routes/home")), ErrorBoundary: RouteErrorBoundary },
            { path: "classes", lazy: lazyPage(() => import("./routes/classes")), ErrorBoundary: RouteErrorBoundary },
            { path: "classes/:classId", lazy: lazyPage(() => import("./routes/class-detail")), ErrorBoundary: RouteErrorBoundary },
            { path: "plans", lazy: lazyPage(() => import("./routes/plans")), ErrorBoundary: RouteErrorBoundary },
            { path: "plans/new", lazy: lazyPage(() => import("./routes/plan-edit")), ErrorBoundary: RouteErrorBoundary },
            { path: "plans/:planId", lazy: lazyPage(() => import("./routes/plan-edit")), ErrorBoundary: RouteErrorBoundary },
            { path: "department", lazy: lazyPage(() => import("./routes/department")), ErrorBoundary: RouteErrorBoundary },
            { path: "staff", lazy: lazyPage(() => import("./routes/staff")), ErrorBoundary: RouteErrorBoundary },
            { path: "pupil-data", lazy: lazyPage(() => import("./routes/pupil-data")), ErrorBoundary: RouteErrorBoundary },
            { path: "privacy", lazy: lazyPage(() => import("./routes/privacy")), ErrorBoundary: RouteErrorBoundary },
            { path: "captured-mail", lazy: lazyPage(() => import("./routes/captured-mail")), ErrorBoundary: RouteErrorBoundary },
            {
              path: "help/real-demonstrations",
              lazy: lazyPage(() => import("./routes/real-demonstrations")),
              ErrorBoundary: RouteErrorBoundary,
            },
            { path: "*", lazy: lazyPage(() => import("./routes/not-found")), ErrorBoundary: RouteErrorBoundary },
          ],
        },
      ],
    },
  ]);
}
