import type { SessionInfo } from "../contracts/session";
import type { Actor } from "../staff/staff.repository";

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport puts the signed-in staff member on req.user.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends Actor {}
  }
}

declare module "express-session" {
  interface SessionData {
    /** Where to go after sign-in (a local path). */
    returnTo?: string;
    /** Why the last sign-in did not lead to an account; shown once by the client. */
    signInNotice?: NonNullable<SessionInfo["notice"]>;
    /** The invitation whose link started this sign-in (cleared when sign-in regenerates the session). */
    invitationId?: string;
  }
}

export {};
