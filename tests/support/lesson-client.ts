/**
 * socket.io clients for live-lesson tests: pupils' devices (no cookie) and staff tabs (with the
 * session cookie of an HttpAgent), and a way to send an event and wait for its acknowledgement.
 */
import { io as connect, type Socket } from "socket.io-client";
import type { PupilSession } from "../../server/contracts/lessons";
import { PROTOCOL_VERSION, type AckReply, type ClientToServerEvents, type ServerToClientEvents } from "../../server/contracts/socket-events";
import type { HttpAgent } from "./http-agent";

export type ClientSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

export interface OpenOptions {
  /** Staff: the agent whose session cookie the socket carries. */
  agent?: HttpAgent;
  /** Reconnect on its own after the server goes away (off unless asked for). */
  reconnection?: boolean;
}

export class SocketPool {
  private sockets: ClientSocket[] = [];

  constructor(private readonly url: () => string) {}

  async open(options: OpenOptions = {}): Promise<ClientSocket> {
    const socket: ClientSocket = connect(this.url(), {
      transports: ["websocket"],
      auth: { protocol: PROTOCOL_VERSION },
      extraHeaders: options.agent ? { cookie: options.agent.cookieHeader() } : {},
      reconnection: options.reconnection ?? false,
      reconnectionDelay: 100,
      reconnectionDelayMax: 400,
      forceNew: true,
    });
    this.sockets.push(socket);
    await new Promise<void>((resolve, reject) => {
      socket.once("connect", resolve);
      socket.once("connect_error", reject);
    });
    return socket;
  }

  closeAll() {
    for (const s of this.sockets.splice(0)) s.close();
  }
}

/**
 * Sends `event` and resolves with the acknowledgement. Payloads are deliberately loose so tests
 * can send what a misbehaving client would.
 */
export async function call<T = unknown>(socket: ClientSocket, event: keyof ClientToServerEvents, payload?: unknown): Promise<AckReply<T>> {
  const loose = socket.timeout(5000) as unknown as { emitWithAck(event: string, ...args: unknown[]): Promise<AckReply<T>> };
  return payload === undefined ? loose.emitWithAck(event) : loose.emitWithAck(event, payload);
}

/** The acknowledgement's data, or a thrown error naming the code it carried. */
export async function ok<T = unknown>(socket: ClientSocket, event: keyof ClientToServerEvents, payload?: unknown): Promise<T> {
  const reply = await call<T>(socket, event, payload);
  if ("error" in reply) throw new Error(`${event} answered ${reply.error.code}: ${reply.error.message}`);
  return reply.data;
}

/** The error code of an acknowledgement (undefined when it succeeded). */
export const codeOf = (reply: AckReply<unknown>) => ("error" in reply ? reply.error.code : undefined);

export async function joinAs(pool: SocketPool, code: string, name: string, options: OpenOptions = {}) {
  const socket = await pool.open(options);
  const session = await ok<PupilSession>(socket, "lesson:join", { code, name });
  return { socket, session };
}

/** Resolves with the next `event` that satisfies `match`. */
export function nextEvent<E extends keyof ServerToClientEvents>(
  socket: ClientSocket,
  event: E,
  match: (...args: Parameters<ServerToClientEvents[E]>) => boolean = () => true,
  timeoutMs = 5000,
): Promise<Parameters<ServerToClientEvents[E]>> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      (socket as unknown as { off(e: string, l: unknown): void }).off(event, listener);
      reject(new Error(`no ${event} within ${timeoutMs} ms`));
    }, timeoutMs);
    const listener = (...args: Parameters<ServerToClientEvents[E]>) => {
      if (!match(...args)) return;
      clearTimeout(timer);
      (socket as unknown as { off(e: string, l: unknown): void }).off(event, listener);
      resolve(args);
    };
    (socket as unknown as { on(e: string, l: unknown): void }).on(event, listener);
  });
}

/** Polls until `check` returns true (for state that arrives in the database after an event). */
export async function eventually(check: () => Promise<boolean>, timeoutMs = 5000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error("condition not met in time");
    await new Promise((r) => setTimeout(r, 25));
  }
}
