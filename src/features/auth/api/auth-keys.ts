/** Query keys for the auth feature. Everything about "who am I" hangs under `auth`. */
export const authKeys = {
  all: ["auth"] as const,
  session: () => [...authKeys.all, "session"] as const,
};
