import { useEffect, useRef } from "react";
import { useLocation } from "react-router";

/**
 * After moving to another page, put focus on its heading (or its main region), as a full page
 * load would, so screen readers announce the new page and keyboard users start at the top.
 */
export function useRouteFocus() {
  const { pathname, hash } = useLocation();
  const first = useRef(true);
  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    if (hash) return;
    const frame = requestAnimationFrame(() => {
      const target = document.querySelector<HTMLElement>("main h1") ?? document.getElementById("main");
      target?.focus({ preventScroll: true });
    });
    return () => cancelAnimationFrame(frame);
  }, [pathname, hash]);
}
