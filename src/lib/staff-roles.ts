import type { StaffRole } from "@contracts/staff";

/**
 * The contract's role labels and teaching roles, repeated here on purpose: importing them from
 * `@contracts/staff` at run time would pull zod (≈ 23 KB gzip) into the first page load, which
 * the header needs before any form does. `staff-roles.test.ts` fails if the two ever differ.
 */
export const ROLE_LABELS: Record<StaffRole, string> = {
  teacher: "Teacher",
  head_of_department: "Head of department",
  admin: "School admin",
};

const TEACHING: Record<StaffRole, boolean> = {
  teacher: true,
  head_of_department: true,
  admin: false,
};

/** Roles that own and teach classes. */
export const isTeachingRole = (role: StaffRole) => TEACHING[role];
