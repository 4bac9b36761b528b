import type { Me } from "@contracts/staff";
import { useSession } from "@/features/auth/api/get-session";

/** The signed-in member of staff. Only for pages inside the signed-in layout, which waits for it. */
export function useMe(): Me {
  const { data } = useSession();
  if (!data?.user) throw new Error("useMe used outside the signed-in layout");
  return data.user;
}
