/** Query keys for the school's pupil-data settings and the admin's class list. */
export const pupilDataKeys = {
  all: ["pupil-data"] as const,
  retention: () => [...pupilDataKeys.all, "retention"] as const,
  schoolClasses: () => [...pupilDataKeys.all, "school-classes"] as const,
};
