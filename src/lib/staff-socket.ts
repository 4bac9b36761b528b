/**
 * The staff socket. This module is loaded on demand (dynamic import) once someone is signed in,
 * so socket.io-client stays out of the first page load.
 */
import { io, type Socket } from "socket.io-client";
import { PROTOCOL_VERSION, type ClientToServerEvents, type ServerToClientEvents } from "@contracts/socket-events";

export type StaffSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** Opens a socket to this origin; the session cookie identifies the member of staff. */
export function openStaffSocket(): StaffSocket {
  return io({
    path: "/socket.io",
    auth: { protocol: PROTOCOL_VERSION },
    withCredentials: true,
  });
}

/** The server refused the handshake because this page's code is older (or newer) than the server's. */
export const isProtocolMismatch = (error: Error) => error.message === "protocol_mismatch";
