/** Query keys for the demo's captured mail. */
export const capturedMailKeys = {
  all: ["captured-mail"] as const,
  list: () => [...capturedMailKeys.all, "list"] as const,
};
