import { useEffect } from "react";
import { useBlocker } from "react-router";
import { readNavigationState } from "@/lib/navigation-state";

/**
 * While `dirty`, asks before leaving: in-app navigation is held by the router (show
 * `UnsavedChangesDialog` with the returned blocker), and closing or reloading the tab gets the
 * browser's own warning. Navigations marked `leaveUnsaved` (forced sign-out) pass.
 */
export function useUnsavedChanges(dirty: boolean) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty &&
      !readNavigationState(nextLocation.state).leaveUnsaved &&
      (currentLocation.pathname !== nextLocation.pathname || currentLocation.search !== nextLocation.search),
  );

  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers need returnValue set to show the prompt.
      event.returnValue = "";
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);

  // Changes saved while a navigation was held: let it go on.
  useEffect(() => {
    if (!dirty && blocker.state === "blocked") blocker.reset();
  }, [dirty, blocker]);

  return blocker;
}
