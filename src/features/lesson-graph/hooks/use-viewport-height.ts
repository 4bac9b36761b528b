import { useSyncExternalStore } from "react";

const subscribe = (onChange: () => void) => {
  window.addEventListener("resize", onChange);
  return () => window.removeEventListener("resize", onChange);
};

/** The window's inner height in CSS px, kept current on resize (board text scales with it). */
export function useViewportHeight(): number {
  return useSyncExternalStore(subscribe, () => window.innerHeight, () => 768);
}
