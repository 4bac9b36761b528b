import { z } from "zod";

/** A message the local SMTP server caught (demo mode only), as the admin's page shows it. */
export const capturedMailSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
});
export type CapturedMail = z.infer<typeof capturedMailSchema>;
