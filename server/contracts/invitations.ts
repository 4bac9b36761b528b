import { z } from "zod";
import { staffRoleSchema } from "./staff";

/** How long an invitation link works. A resend starts the period again with a new link. */
export const INVITATION_LIFETIME_DAYS = 14;

export const INVITATION_LIMITS = { displayName: 80, email: 254 } as const;

export const invitationEmailSchema = z
  .string({ error: "Give the e-mail address." })
  .transform((s) => s.trim().toLowerCase())
  .pipe(
    z
      .email("Give a whole e-mail address, for example “sam.reed@school.example”.")
      .max(INVITATION_LIMITS.email, `Keep the e-mail address to ${INVITATION_LIMITS.email} characters or fewer.`),
  );

export const inviteStaffInputSchema = z
  .object({
    displayName: z
      .string({ error: "Give the person’s name." })
      .transform((s) => s.replace(/\s+/g, " ").trim())
      .pipe(
        z
          .string()
          .min(1, "Give the person’s name, as colleagues know it.")
          .max(INVITATION_LIMITS.displayName, `Keep the name to ${INVITATION_LIMITS.displayName} characters or fewer.`)
          .refine((s) => !/[\u0000-\u001f\u007f<>]/.test(s), "The name contains characters that cannot be used."),
      ),
    email: invitationEmailSchema,
    role: staffRoleSchema,
    departmentId: z.uuid("Choose a department from the list.").nullable(),
  })
  .superRefine((input, ctx) => {
    // Teachers and heads of department own classes, and a class belongs to a department.
    if (input.role !== "admin" && !input.departmentId) {
      ctx.addIssue({ code: "custom", path: ["departmentId"], message: "Choose the department they will teach in." });
    }
  });
export type InviteStaffInput = z.input<typeof inviteStaffInputSchema>;
export type InviteStaffValues = z.output<typeof inviteStaffInputSchema>;

export const INVITATION_STATES = ["pending", "expired"] as const;
export type InvitationState = (typeof INVITATION_STATES)[number];

/** An invitation nobody has used or cancelled yet (it may have expired: then it can be resent). */
export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  role: staffRoleSchema,
  department: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  invitedBy: z.string().nullable(),
  createdAt: z.string(),
  expiresAt: z.string(),
  /** When the e-mail last went out; null if the mail server has never taken it. */
  lastSentAt: z.string().nullable(),
  state: z.enum(INVITATION_STATES),
});
export type Invitation = z.infer<typeof invitationSchema>;

export const departmentSchema = z.object({ id: z.uuid(), name: z.string() });
export type Department = z.infer<typeof departmentSchema>;
