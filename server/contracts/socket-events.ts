import { z } from "zod";
import type { ErrorCode } from "./error-codes";

/**
 * The one map of socket.io events, used as generics on both ends:
 * `Server<ClientToServerEvents, ServerToClientEvents, …>` and `Socket<ServerToClientEvents, ClientToServerEvents>`.
 * Requests are `entity:verb`; broadcasts are past tense. Bump PROTOCOL_VERSION on any breaking change.
 */
export const PROTOCOL_VERSION = 1;

export const handshakeAuthSchema = z.object({
  protocol: z.number().int(),
});
export type HandshakeAuth = z.infer<typeof handshakeAuthSchema>;

export type Ack<T> = (reply: { data: T } | { error: { code: ErrorCode; message: string } }) => void;

export interface ServerToClientEvents {
  /** This browser's staff session ended (signed out here or elsewhere, or access removed). */
  "session:ended": (payload: { reason: "signed_out" | "signed_out_everywhere" | "access_changed" }) => void;
  /** This member of staff's role or details changed: fetch the session again. */
  "session:changed": () => void;
}

export interface ClientToServerEvents {
  /** Who this connection is, as the server sees it. */
  "session:whoami": (ack: Ack<{ staffId: string | null }>) => void;
}

export interface SocketData {
  staffId: string | null;
  sessionId: string | null;
}

/** Rooms a staff connection joins, so sign-out can reach every open tab and device. */
export const rooms = {
  session: (sessionId: string) => `session:${sessionId}`,
  staff: (staffId: string) => `staff:${staffId}`,
} as const;
