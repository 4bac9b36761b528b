/** Query keys for live lessons as listed on class and home pages (the board keeps its own live cache). */
export const lessonListKeys = {
  all: ["lesson-lists"] as const,
  forClass: (classId: string) => [...lessonListKeys.all, "class", classId] as const,
  open: () => [...lessonListKeys.all, "open"] as const,
  recent: () => [...lessonListKeys.all, "recent"] as const,
};
