/** Query keys for lesson plans: the list, one plan, and the editor's theory previews. */
export const planKeys = {
  all: ["lesson-plans"] as const,
  lists: () => [...planKeys.all, "list"] as const,
  detail: (planId: string) => [...planKeys.all, "detail", planId] as const,
  preview: (setup: unknown) => [...planKeys.all, "preview", JSON.stringify(setup)] as const,
};
