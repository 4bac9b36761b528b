/**
 * The pupil page (/join, /join/CODE): loaded on its own, without the staff app's router,
 * queries, charts or simulation, so it opens fast on a phone on school Wi-Fi.
 */
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { io } from "socket.io-client";
import { PROTOCOL_VERSION } from "@contracts/protocol";
import { PupilApp } from "./pupil-app";
import { PupilClient, type PupilSocket } from "./pupil-client";
import { codeFromPath } from "./pupil-format";
import "../styles/app.css";

const root = document.getElementById("root");
if (!root) throw new Error("index.html has no #root element");

// Pupils have no account: no cookies are needed, the resume token identifies the device.
const socket: PupilSocket = io({ path: "/socket.io", auth: { protocol: PROTOCOL_VERSION }, withCredentials: false });
const client = new PupilClient(socket, window.localStorage, codeFromPath(window.location.pathname));

// Keep the address at /join/CODE once a code is chosen, so a reload comes back to the same lesson.
client.subscribe(() => {
  const { code } = client.getState();
  const want = code ? `/join/${code}` : null;
  if (want && window.location.pathname !== want) window.history.replaceState(null, "", want);
});

document.title = "Join a lesson – Linkleap";

createRoot(root).render(
  <StrictMode>
    <PupilApp client={client} />
  </StrictMode>,
);
