/** What a key does on the board. */
export type BoardAction = "next-phase" | "run" | "toggle-play" | "toggle-slow" | "replay" | "back" | "forward" | "help";

/** Shown in the help overlay, in this order. */
export const BOARD_SHORTCUTS: readonly { keys: string[]; action: BoardAction; text: string }[] = [
  { keys: ["N"], action: "next-phase", text: "Next phase (→ too, while the run is not paused)" },
  { keys: ["R"], action: "run", text: "Run: play the simulation (closes predictions if they are open)" },
  { keys: ["Space"], action: "toggle-play", text: "Pause or play" },
  { keys: ["S"], action: "toggle-slow", text: "Slow motion on or off (¼ speed)" },
  { keys: ["0", "Home"], action: "replay", text: "Replay from the start" },
  { keys: ["←", "→"], action: "back", text: "Step back or forward while paused" },
  { keys: ["?"], action: "help", text: "Show or hide this list" },
];

interface KeyLike {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
  /** The element the key was pressed in. */
  target?: unknown;
}

/** True when the key belongs to a field, a button or a slider, not to the board. */
export function isTypingTarget(target: unknown): boolean {
  const el = target as { tagName?: string; isContentEditable?: boolean; getAttribute?: (name: string) => string | null } | null;
  if (!el || typeof el.tagName !== "string") return false;
  const tag = el.tagName.toUpperCase();
  if (tag === "INPUT" || tag === "TEXTAREA" || tag === "SELECT" || el.isContentEditable) return true;
  const role = el.getAttribute?.("role");
  return role === "slider" || role === "textbox" || role === "spinbutton";
}

/**
 * The board's action for a key, or null. Keys typed into a field, or with Ctrl/Cmd/Alt, are
 * never taken. → is the next phase while the run plays, and a step forward while paused.
 */
export function boardActionFor(event: KeyLike, state: { paused: boolean }): BoardAction | null {
  if (event.ctrlKey || event.metaKey || event.altKey) return null;
  if (isTypingTarget(event.target)) return null;
  // Space on a focused button presses the button.
  if (event.key === " " && (event.target as { tagName?: string } | null)?.tagName?.toUpperCase() === "BUTTON") return null;
  switch (event.key) {
    case "n":
    case "N":
      return "next-phase";
    case "ArrowRight":
      return state.paused ? "forward" : "next-phase";
    case "ArrowLeft":
      return state.paused ? "back" : null;
    case "r":
    case "R":
      return "run";
    case " ":
      return "toggle-play";
    case "s":
    case "S":
      return "toggle-slow";
    case "0":
    case "Home":
      return "replay";
    case "?":
      return "help";
    default:
      return null;
  }
}
