/**
 * The baseline for `npm run bench:live`: a bare socket.io server that does the least a live
 * lesson must do with a prediction — acknowledge it and pass it to the board's room — with no
 * database, no validation and no authorization. Prints its port on stdout.
 */
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { Server } from "socket.io";

const httpServer = createServer();
const io = new Server(httpServer, { serveClient: false });
io.on("connection", (socket) => {
  socket.on("board:join", (lessonId: string, ack: () => void) => {
    void socket.join(`board:${lessonId}`);
    ack();
  });
  socket.on("prediction:submit", (payload: { lessonId: string; clientId: string }, ack: (r: unknown) => void) => {
    ack({ data: { clientId: payload.clientId } });
    io.to(`board:${payload.lessonId}`).emit("prediction:added", { clientId: payload.clientId });
  });
});
httpServer.listen(0, "127.0.0.1", () => {
  console.log(`port=${(httpServer.address() as AddressInfo).port}`);
});
process.on("SIGTERM", () => {
  io.close();
  process.exit(0);
});
