import { useEffect, useRef } from "react";
import { boardActionFor, type BoardAction } from "./board-keys";

/** Listens for the board's keys on the whole page; `paused` decides what the arrows do. */
export function useBoardKeys(onAction: (action: BoardAction) => void, isPaused: () => boolean) {
  const latest = useRef({ onAction, isPaused });
  latest.current = { onAction, isPaused };
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      // A modal dialog (help, confirm) keeps its own keys.
      if (document.querySelector("dialog[open]")) return;
      const action = boardActionFor(event, { paused: latest.current.isPaused() });
      if (!action) return;
      event.preventDefault();
      latest.current.onAction(action);
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, []);
}
