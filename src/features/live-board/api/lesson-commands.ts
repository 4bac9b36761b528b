import type { AckReply, ClientToServerEvents } from "@contracts/socket-events";
import { ApiError } from "@/lib/api-client";

/** What the board and the remote send about a lesson (all acknowledged by the server). */
export type LessonCommand =
  | "lesson:watch"
  | "trial:add"
  | "trial:setup"
  | "trial:show"
  | "trial:phase"
  | "trial:result"
  | "trial:tally"
  | "explanation:show"
  | "lesson:settings"
  | "lesson:end"
  | "board:control";

export type CommandPayload<E extends LessonCommand> = Parameters<ClientToServerEvents[E]>[0];
export type CommandReply<E extends LessonCommand> =
  Parameters<Parameters<ClientToServerEvents[E]>[1]>[0] extends AckReply<infer T> ? T : never;

/** The part of a socket.io client socket a command needs (a fake in tests). */
export interface CommandSocket {
  timeout(ms: number): { emitWithAck(event: string, payload: unknown): Promise<unknown> };
}

/** How long a command waits for the server before saying so. */
export const COMMAND_TIMEOUT_MS = 8000;

export const TIMEOUT_MESSAGE = "The server did not answer in time. Check the connection and try again.";

/**
 * Sends one command and waits for its acknowledgement: `{ data }` resolves, `{ error }` throws an
 * ApiError with the server's message and field messages (so forms can show them beside fields),
 * and no answer within the timeout throws a network error.
 */
export async function sendCommand<E extends LessonCommand>(
  socket: CommandSocket,
  event: E,
  payload: CommandPayload<E>,
  timeoutMs = COMMAND_TIMEOUT_MS,
): Promise<CommandReply<E>> {
  let reply: unknown;
  try {
    reply = await socket.timeout(timeoutMs).emitWithAck(event, payload);
  } catch {
    // socket.io rejects only on timeout (the server never acknowledged).
    throw new ApiError(0, "network_error", TIMEOUT_MESSAGE);
  }
  if (reply && typeof reply === "object" && "error" in reply) {
    const { code, message, fields } = (reply as { error: { code: ApiError["code"]; message: string; fields?: Record<string, string[]> } }).error;
    throw new ApiError(0, code, message, fields ?? {});
  }
  if (reply && typeof reply === "object" && "data" in reply) return (reply as { data: CommandReply<E> }).data;
  throw new ApiError(0, "bad_response", "The server answered in a way this page did not understand.");
}
