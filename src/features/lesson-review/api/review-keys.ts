/** Query keys of lesson reviews (read after the lesson; a finished lesson no longer changes). */
export const reviewKeys = {
  all: ["lesson-reviews"] as const,
  lesson: (lessonId: string) => [...reviewKeys.all, lessonId] as const,
};
