/**
 * Staff roles as plain values, without zod, so the client's first page load can use them.
 * A head of department is a teacher who also sees the department; an admin manages staff.
 */
export const STAFF_ROLES = ["teacher", "head_of_department", "admin"] as const;
export type StaffRole = (typeof STAFF_ROLES)[number];

export const STAFF_ROLE_LABELS: Record<StaffRole, string> = {
  teacher: "Teacher",
  head_of_department: "Head of department",
  admin: "School admin",
};

/** Roles that own and teach classes. */
export const TEACHING_ROLES: readonly StaffRole[] = ["teacher", "head_of_department"];
export const isTeachingRole = (role: StaffRole) => TEACHING_ROLES.includes(role);
