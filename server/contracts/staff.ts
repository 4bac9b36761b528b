import { z } from "zod";

/** A head of department is a teacher who also sees the department; an admin manages staff. */
export const STAFF_ROLES = ["teacher", "head_of_department", "admin"] as const;
export const staffRoleSchema = z.enum(STAFF_ROLES);
export type StaffRole = z.infer<typeof staffRoleSchema>;

export const STAFF_ROLE_LABELS: Record<StaffRole, string> = {
  teacher: "Teacher",
  head_of_department: "Head of department",
  admin: "School admin",
};

/** Roles that own and teach classes. */
export const TEACHING_ROLES: readonly StaffRole[] = ["teacher", "head_of_department"];

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
