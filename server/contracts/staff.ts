import { z } from "zod";
import { STAFF_ROLES } from "./staff-roles";

export const staffRoleSchema = z.enum(STAFF_ROLES);

export const meSchema = z.object({
  id: z.uuid(),
  displayName: z.string(),
  email: z.string(),
  role: staffRoleSchema,
  school: z.object({ id: z.uuid(), name: z.string() }),
  department: z.object({ id: z.uuid(), name: z.string() }).nullable(),
});
export type Me = z.infer<typeof meSchema>;

export const staffMemberSchema = z.object({
  id: z.uuid(),
  displayName: z.string(),
  email: z.string(),
  role: staffRoleSchema,
  department: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  lastSignInAt: z.string().nullable(),
});
export type StaffMember = z.infer<typeof staffMemberSchema>;

export const updateStaffRoleInputSchema = z.object({
  role: staffRoleSchema,
});
export type UpdateStaffRoleInput = z.infer<typeof updateStaffRoleInputSchema>;
