import nodemailer from "nodemailer";

export interface SmtpSettings {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  pass?: string;
  from: string;
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/**
 * Sends mail over SMTP with nodemailer: the school's server in production, the local SMTP
 * server (devstack/mail-catcher.ts) in the demo and tests. No pupil names ever go in a message.
 */
export function createMailer(settings: SmtpSettings) {
  const transport = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    auth: settings.user ? { user: settings.user, pass: settings.pass ?? "" } : undefined,
    // The local server speaks plain SMTP on loopback; elsewhere STARTTLS is used when offered.
    ignoreTLS: settings.host === "127.0.0.1" || settings.host === "localhost",
  });
  return {
    async send(mail: OutgoingMail) {
      const info = await transport.sendMail({ from: settings.from, ...mail });
      return { messageId: info.messageId };
    },
    close: () => transport.close(),
  };
}
export type Mailer = ReturnType<typeof createMailer>;
