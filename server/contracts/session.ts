import { z } from "zod";
import { meSchema } from "./staff";

/**
 * What the client learns about its own sign-in. Always 200: `user` is null when signed out,
 * and `notice` explains a sign-in that did not lead to an account.
 */
export const sessionInfoSchema = z.object({
  user: meSchema.nullable(),
  notice: z
    .discriminatedUnion("kind", [
      z.object({ kind: z.literal("not_invited"), email: z.string() }),
      z.object({ kind: z.literal("sign_in_cancelled") }),
      z.object({ kind: z.literal("sign_in_failed") }),
      /** The invitation link was already used, cancelled, past its date, or never existed. */
      z.object({ kind: z.literal("invitation_closed"), reason: z.enum(["used", "cancelled", "expired", "unknown"]) }),
      /** The invitation was for another address than the one signed in with. */
      z.object({ kind: z.literal("invitation_other_account"), email: z.string() }),
    ])
    .nullable(),
  /** True in the demo, where sign-in goes through the local sign-in page. */
  demo: z.boolean(),
});
export type SessionInfo = z.infer<typeof sessionInfoSchema>;
