import type { ServerToClientEvents } from "@contracts/socket-events";

/** Why this browser was signed out, as the server's `session:ended` event says. */
export type SignedOutReason = Parameters<ServerToClientEvents["session:ended"]>[0]["reason"];

/**
 * Router state carried by navigations the app makes on its own. `leaveUnsaved` lets a forced
 * navigation (signed out elsewhere) pass the unsaved-changes guard: there is nothing to save to.
 */
export interface AppNavigationState {
  signedOut?: SignedOutReason;
  leaveUnsaved?: boolean;
}

export const SIGNED_OUT_MESSAGES: Record<SignedOutReason, string> = {
  signed_out: "You were signed out.",
  signed_out_everywhere: "You were signed out on all devices.",
  access_changed: "Your access changed. Sign in again to continue.",
};

/** Reads our own state from `location.state`, which may hold anything (history survives reloads). */
export function readNavigationState(state: unknown): AppNavigationState {
  if (typeof state !== "object" || state === null) return {};
  const { signedOut, leaveUnsaved } = state as Record<string, unknown>;
  return {
    signedOut: typeof signedOut === "string" && Object.hasOwn(SIGNED_OUT_MESSAGES, signedOut) ? (signedOut as SignedOutReason) : undefined,
    leaveUnsaved: leaveUnsaved === true,
  };
}
