import { useEffect, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { authKeys } from "../api/auth-keys";
import { useLeaveAfterSignOut } from "./use-leave-after-sign-out";

/**
 * `off`: nobody signed in; `connecting` / `live` / `reconnecting`: the usual; `outdated`: the
 * server speaks a newer protocol and this page must be reloaded; `unavailable`: the socket code
 * could not be loaded (offline).
 */
export type SessionSocketStatus = "off" | "connecting" | "live" | "reconnecting" | "outdated" | "unavailable";

/**
 * Keeps one socket open while someone is signed in, so that signing out elsewhere or a role
 * change reaches this tab at once.
 */
export function useSessionSocket(staffId: string | null | undefined): SessionSocketStatus {
  const queryClient = useQueryClient();
  const leave = useLeaveAfterSignOut();
  const [status, setStatus] = useState<SessionSocketStatus>("off");

  useEffect(() => {
    if (!staffId) {
      setStatus("off");
      return;
    }
    let cancelled = false;
    let disconnect: (() => void) | undefined;
    setStatus("connecting");

    import("@/lib/staff-socket")
      .then(({ openStaffSocket, isProtocolMismatch }) => {
        if (cancelled) return;
        const socket = openStaffSocket();
        disconnect = () => socket.disconnect();
        socket.on("connect", () => setStatus("live"));
        socket.on("disconnect", () => setStatus((s) => (s === "outdated" ? s : "reconnecting")));
        socket.on("connect_error", (error) => {
          if (isProtocolMismatch(error)) {
            setStatus("outdated");
            socket.disconnect();
          } else {
            setStatus("reconnecting");
          }
        });
        socket.on("session:ended", ({ reason }) => {
          socket.disconnect();
          leave(reason);
        });
        socket.on("session:changed", () => {
          void queryClient.invalidateQueries({ queryKey: authKeys.session() });
        });
      })
      .catch(() => {
        if (!cancelled) setStatus("unavailable");
      });

    return () => {
      cancelled = true;
      disconnect?.();
    };
  }, [staffId, queryClient, leave]);

  return status;
}
