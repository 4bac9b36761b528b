/** Query keys for staff management: the staff list, open invitations and the departments to invite to. */
export const staffKeys = {
  all: ["staff"] as const,
  lists: () => [...staffKeys.all, "list"] as const,
  invitations: () => [...staffKeys.all, "invitations"] as const,
  departments: () => [...staffKeys.all, "departments"] as const,
};
