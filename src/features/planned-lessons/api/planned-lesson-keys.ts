/** Query keys for the teacher's diary of planned lessons. */
export const plannedLessonKeys = {
  all: ["planned-lessons"] as const,
  upcoming: () => [...plannedLessonKeys.all, "upcoming"] as const,
};
