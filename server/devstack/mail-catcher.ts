/**
 * A local SMTP server for the demo, development and tests: it accepts every message over
 * real SMTP (smtp-server) and keeps it as an .eml file so it can be read in development.
 */
import { randomUUID } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import type { AddressInfo } from "node:net";
import { join } from "node:path";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface CaughtMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
}

/** Parses one stored message; its id (the file name) starts with the time it arrived. */
async function parse(id: string, raw: Buffer): Promise<CaughtMail> {
  const parsed = await simpleParser(raw);
  const to = [parsed.to].flat().flatMap((a) => a?.value.map((v) => v.address ?? "") ?? []);
  return {
    id,
    receivedAt: new Date(Number(id.split("-")[0])).toISOString(),
    from: parsed.from?.text ?? "",
    to,
    subject: parsed.subject ?? "",
    text: parsed.text ?? "",
    html: typeof parsed.html === "string" ? parsed.html : null,
  };
}

/** The messages kept in `dir`, newest first, at most `limit` of them; none if the folder does not exist yet. */
export async function readCapturedMail(dir: string, limit = Infinity): Promise<CaughtMail[]> {
  if (!existsSync(dir)) return [];
  const files = readdirSync(dir)
    .filter((f) => f.endsWith(".eml"))
    .sort()
    .reverse()
    .slice(0, limit);
  return Promise.all(files.map((f) => parse(f.replace(/\.eml$/, ""), readFileSync(join(dir, f)))));
}

export function createMailCatcher(options: { dir: string; maxBytes?: number }) {
  mkdirSync(options.dir, { recursive: true });
  const listeners = new Set<(mail: CaughtMail) => void>();

  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    size: options.maxBytes ?? 10 * 1024 * 1024,
    logger: false,
    banner: "Linkleap local mail",
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        const raw = Buffer.concat(chunks);
        const id = `${Date.now()}-${randomUUID().slice(0, 8)}`;
        writeFileSync(join(options.dir, `${id}.eml`), raw);
        parse(id, raw)
          .then((mail) => {
            const to = session.envelope.rcptTo.map((r) => r.address);
            for (const listener of listeners) listener({ ...mail, to: to.length ? to : mail.to });
            callback();
          })
          .catch(callback);
      });
    },
  });

  return {
    async listen(port: number, host = "127.0.0.1"): Promise<AddressInfo> {
      await new Promise<void>((resolve, reject) => {
        server.server.once("error", reject);
        server.listen(port, host, () => resolve());
      });
      return server.server.address() as AddressInfo;
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
    /** Every message received so far, newest first. */
    messages: (): Promise<CaughtMail[]> => readCapturedMail(options.dir),
    /** Resolves with the next message that matches, or rejects after `timeoutMs`. */
    waitFor(match: (mail: CaughtMail) => boolean, timeoutMs = 5_000): Promise<CaughtMail> {
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => {
          listeners.delete(listener);
          reject(new Error(`No matching message within ${timeoutMs} ms`));
        }, timeoutMs);
        const listener = (mail: CaughtMail) => {
          if (!match(mail)) return;
          clearTimeout(timer);
          listeners.delete(listener);
          resolve(mail);
        };
        listeners.add(listener);
      });
    },
  };
}
export type MailCatcher = ReturnType<typeof createMailCatcher>;
