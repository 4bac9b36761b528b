/** Socket protocol version, sent in the handshake. Zod-free so the pupil page's first load can import it. */
export const PROTOCOL_VERSION = 2;
