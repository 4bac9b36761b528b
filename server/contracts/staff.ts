import { z } from "zod";
import { STAFF_ROLES } from "./staff-roles";

export const staffRoleSchema = z.enum(STAFF_ROLES);

export const meSchema = z.object({
  id: z.uuid(),
  displayName: z.string(),
  email: z.string(),
  role: staffRoleSchema,
  school: z.object({ id: z.uuid(), name: z.string(), timeZone: z.string() }),
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

/**
 * What an admin may change about a member of staff: their role, their department (`null` for
 * none), or both in one request. Whether the result is allowed (a head keeps a department, the
 * department is the school's own) is checked by the server.
 */
export const updateStaffInputSchema = z
  .object({
    role: staffRoleSchema.optional(),
    departmentId: z.uuid("Choose a department from the list.").nullable().optional(),
  })
  .refine((input) => input.role !== undefined || input.departmentId !== undefined, {
    message: "Choose a new role or department to save.",
  });
export type UpdateStaffInput = z.infer<typeof updateStaffInputSchema>;
