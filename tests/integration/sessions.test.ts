import { io as connect, type Socket } from "socket.io-client";
import { afterAll, describe, expect, it } from "vitest";
import type { SessionInfo } from "../../server/contracts/session";
import { PROTOCOL_VERSION, type ClientToServerEvents, type ServerToClientEvents } from "../../server/contracts/socket-events";
import { PEOPLE, seedFixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { useTestStack } from "../support/test-stack";

type ClientSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

const ctx = useTestStack(seedFixture);
const sockets: ClientSocket[] = [];

afterAll(async () => {
  for (const s of sockets) s.close();
});

/** A socket.io client carrying the agent's cookies, as a browser tab would. */
function openSocket(agent: HttpAgent | null, protocol = PROTOCOL_VERSION): ClientSocket {
  const socket: ClientSocket = connect(ctx.stack.url, {
    transports: ["websocket"],
    auth: { protocol },
    extraHeaders: agent ? { cookie: agent.cookieHeader() } : {},
    reconnection: false,
    forceNew: true,
  });
  sockets.push(socket);
  return socket;
}

const connected = (socket: ClientSocket) =>
  new Promise<void>((resolve, reject) => {
    socket.once("connect", () => resolve());
    socket.once("connect_error", reject);
  });

const whoami = (socket: ClientSocket) =>
  new Promise<string | null>((resolve, reject) =>
    socket.emit("session:whoami", (reply) => ("data" in reply ? resolve(reply.data.staffId) : reject(reply.error))),
  );

describe("sessions", () => {
  it("survive a server restart: they are stored in Postgres, not in the process", async () => {
    const agent = new HttpAgent(ctx.stack.url);
    await signIn(agent, PEOPLE.teacherA.email);
    expect((await agent.json<SessionInfo>("/api/session")).body.user?.id).toBe(ctx.fixture.staffIds.teacherA);

    await ctx.stack.restartApp();

    const after = await agent.json<SessionInfo>("/api/session");
    expect(after.body.user?.id).toBe(ctx.fixture.staffIds.teacherA);
    expect((await agent.get("/api/classes")).status).toBe(200);
  });

  it("sign-out ends the session for every tab using it, and closes its open sockets", async () => {
    const tab1 = new HttpAgent(ctx.stack.url);
    await signIn(tab1, PEOPLE.teacherB.email);
    // A second tab of the same browser shares the cookie.
    const tab2 = tab1.newTab();
    const socket = openSocket(tab2);
    await connected(socket);
    expect(await whoami(socket)).toBe(ctx.fixture.staffIds.teacherB);
    const ended = new Promise((resolve) => socket.once("session:ended", resolve));
    const disconnected = new Promise((resolve) => socket.once("disconnect", resolve));

    expect((await tab1.post("/auth/sign-out")).status).toBe(204);

    await expect(ended).resolves.toEqual({ reason: "signed_out" });
    await expect(disconnected).resolves.toBe("io server disconnect");
    expect((await tab2.get("/api/classes")).status).toBe(401);
    expect((await tab1.get("/api/classes")).status).toBe(401);
  });

  it("sign-out everywhere ends every session of that person on every device, and only theirs", async () => {
    const laptop = new HttpAgent(ctx.stack.url);
    const phone = new HttpAgent(ctx.stack.url);
    const colleague = new HttpAgent(ctx.stack.url);
    await signIn(laptop, PEOPLE.head.email);
    await signIn(phone, PEOPLE.head.email);
    await signIn(colleague, PEOPLE.teacherA.email);
    const phoneSocket = openSocket(phone);
    await connected(phoneSocket);
    const ended = new Promise((resolve) => phoneSocket.once("session:ended", resolve));

    expect((await laptop.post("/auth/sign-out-everywhere")).status).toBe(204);

    await expect(ended).resolves.toEqual({ reason: "signed_out_everywhere" });
    expect((await phone.get("/api/classes")).status).toBe(401);
    expect((await laptop.get("/api/classes")).status).toBe(401);
    expect((await colleague.get("/api/classes")).status).toBe(200);
  });

  it("a socket from an out-of-date page is refused with protocol_mismatch", async () => {
    const socket = openSocket(null, PROTOCOL_VERSION + 1);
    const error = await new Promise<Error & { data?: { expected?: number } }>((resolve) => socket.once("connect_error", resolve));
    expect(error.message).toBe("protocol_mismatch");
    expect(error.data?.expected).toBe(PROTOCOL_VERSION);
  });

  it("an anonymous socket connects but is nobody", async () => {
    const socket = openSocket(null);
    await connected(socket);
    expect(await whoami(socket)).toBeNull();
  });

  it("a socket opened from another site's page is refused", async () => {
    const socket: ClientSocket = connect(ctx.stack.url, {
      transports: ["websocket"],
      auth: { protocol: PROTOCOL_VERSION },
      extraHeaders: { origin: "http://evil.example" },
      reconnection: false,
      forceNew: true,
    });
    sockets.push(socket);
    await expect(connected(socket)).rejects.toBeInstanceOf(Error);
  });
});
