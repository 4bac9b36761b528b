import type { Server as HttpServer, IncomingMessage, ServerResponse } from "node:http";
import type { RequestHandler } from "express";
import { Server } from "socket.io";
import {
  PROTOCOL_VERSION,
  handshakeAuthSchema,
  rooms,
  type ClientToServerEvents,
  type ServerToClientEvents,
  type SocketData,
} from "../contracts/socket-events";

export type IoServer = Server<ClientToServerEvents, ServerToClientEvents, Record<string, never>, SocketData>;

type EngineRequest = IncomingMessage & { _query?: Record<string, string>; user?: Express.User; sessionID?: string };
type Middleware = (req: IncomingMessage, res: ServerResponse, next: (err?: unknown) => void) => void;

/** Express middleware for the engine, run on the handshake request only (not on every poll). */
const onlyForHandshake =
  (middleware: RequestHandler): Middleware =>
  (req, res, next) => {
    if ((req as EngineRequest)._query?.sid === undefined) (middleware as unknown as Middleware)(req, res, next);
    else next();
  };

export interface RealtimeOptions {
  sessionMiddleware: RequestHandler;
  passportSession: RequestHandler;
  /** Origins allowed to open a socket (the public URL, the dev server). */
  allowedOrigins: string[];
}

/**
 * socket.io on the app's http server. Staff connections carry their express session, so
 * signing out (here or everywhere) reaches every open tab and device at once.
 */
export function createRealtime(httpServer: HttpServer, options: RealtimeOptions) {
  const io: IoServer = new Server(httpServer, {
    serveClient: false,
    allowRequest: (req, callback) => {
      const origin = req.headers.origin;
      callback(null, !origin || options.allowedOrigins.includes(origin));
    },
  });
  io.engine.use(onlyForHandshake(options.sessionMiddleware));
  io.engine.use(onlyForHandshake(options.passportSession));

  io.use((socket, next) => {
    const auth = handshakeAuthSchema.safeParse(socket.handshake.auth);
    if (!auth.success || auth.data.protocol !== PROTOCOL_VERSION) {
      const error = new Error("protocol_mismatch") as Error & { data?: unknown };
      error.data = { expected: PROTOCOL_VERSION, message: "This page is out of date: reload it to continue." };
      return next(error);
    }
    const req = socket.request as EngineRequest;
    socket.data.staffId = req.user?.id ?? null;
    socket.data.sessionId = req.user ? (req.sessionID ?? null) : null;
    socket.data.participant = null;
    next();
  });

  io.on("connection", (socket) => {
    const { staffId, sessionId } = socket.data;
    if (staffId && sessionId) void socket.join([rooms.staff(staffId), rooms.session(sessionId)]);
    socket.on("session:whoami", (ack) => {
      if (typeof ack === "function") ack({ data: { staffId: socket.data.staffId } });
    });
  });

  return {
    io,
    /** Ends one browser session's sockets (sign-out). */
    endSession(sessionId: string, reason: "signed_out") {
      io.to(rooms.session(sessionId)).emit("session:ended", { reason });
      io.in(rooms.session(sessionId)).disconnectSockets(true);
    },
    /** Tells every open tab of one member of staff that their role or details changed. */
    staffChanged(staffId: string) {
      io.to(rooms.staff(staffId)).emit("session:changed");
    },
    /** Ends every socket of one member of staff (sign-out everywhere, access changed). */
    endStaff(staffId: string, reason: "signed_out_everywhere" | "access_changed") {
      io.to(rooms.staff(staffId)).emit("session:ended", { reason });
      io.in(rooms.staff(staffId)).disconnectSockets(true);
    },
  };
}
export type Realtime = ReturnType<typeof createRealtime>;
