/** Query keys of live lessons, from the broadest to the narrowest (invalidate by prefix). */
export const lessonKeys = {
  all: ["live-lessons"] as const,
  lesson: (lessonId: string) => [...lessonKeys.all, lessonId] as const,
  /** The teacher's view of one lesson, kept current by the lesson socket. */
  teacher: (lessonId: string) => [...lessonKeys.lesson(lessonId), "teacher"] as const,
};
