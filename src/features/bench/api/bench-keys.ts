/** Query keys for a class's bench data: `benchKeys.forClass(id)` covers its runs and photos. */
export const benchKeys = {
  all: ["bench"] as const,
  forClass: (classId: string) => [...benchKeys.all, classId] as const,
  runs: (classId: string) => [...benchKeys.forClass(classId), "runs"] as const,
  photos: (classId: string) => [...benchKeys.forClass(classId), "photos"] as const,
};
