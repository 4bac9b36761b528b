import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createMailCatcher, type MailCatcher } from "../../server/devstack/mail-catcher";
import { createMailer, type Mailer } from "../../server/mail/mailer";

let dir: string;
let catcher: MailCatcher;
let mailer: Mailer;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), "linkleap-mail-"));
  catcher = createMailCatcher({ dir });
  const { port } = await catcher.listen(0);
  mailer = createMailer({ host: "127.0.0.1", port, secure: false, from: "Linkleap <linkleap@brackenfold.example>" });
});
afterAll(async () => {
  mailer?.close();
  await catcher?.close();
  rmSync(dir, { recursive: true, force: true });
});

describe("mail through the local SMTP server", () => {
  it("delivers a message with plain-text and HTML parts over real SMTP, and keeps it readable", async () => {
    const arrived = catcher.waitFor((m) => m.subject === "Test message");
    await mailer.send({
      to: "tom.ashdown@brackenfold.example",
      subject: "Test message",
      text: "Plain part: ünïcödé survives.",
      html: "<p>HTML part</p>",
    });
    const mail = await arrived;
    expect(mail.to).toEqual(["tom.ashdown@brackenfold.example"]);
    expect(mail.from).toContain("linkleap@brackenfold.example");
    expect(mail.text.trim()).toBe("Plain part: ünïcödé survives.");
    expect(mail.html).toContain("<p>HTML part</p>");

    const stored = await catcher.messages();
    expect(stored.map((m) => m.subject)).toContain("Test message");
  });
});
