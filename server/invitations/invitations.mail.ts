import { STAFF_ROLE_LABELS, type StaffRole } from "../contracts/staff-roles";
import type { OutgoingMail } from "../mail/mailer";
import { escapeHtml, simpleHtmlMail } from "../mail/html";

export interface InvitationMailDetails {
  to: string;
  displayName: string;
  schoolName: string;
  departmentName: string | null;
  role: StaffRole;
  invitedBy: string | null;
  link: string;
  expiresAt: Date;
  /** The school's time zone: the last day is the school's. */
  timeZone: string;
}

const formatDate = (date: Date, timeZone: string) =>
  date.toLocaleDateString("en-GB", { weekday: "long", day: "numeric", month: "long", year: "numeric", timeZone });

/** The invitation message, as plain text and HTML. Staff details only: no pupil data ever goes in. */
export function invitationMail(d: InvitationMailDetails): OutgoingMail {
  const role = `${d.role === "head_of_department" ? "" : "a "}${STAFF_ROLE_LABELS[d.role].toLowerCase()}`;
  const where = d.departmentName ? `${role} in the ${d.departmentName} department` : role;
  const who = d.invitedBy ? `${d.invitedBy} has invited you` : "You have been invited";
  const expires = formatDate(d.expiresAt, d.timeZone);
  const text = [
    `Hello ${d.displayName},`,
    "",
    `${who} to use Linkleap at ${d.schoolName}, as ${where}.`,
    "",
    `Open this link and sign in with your school account, ${d.to}:`,
    d.link,
    "",
    `The link works once, until ${expires}. If it has run out, ask your school admin to send a new one.`,
    "",
    "If you were not expecting this message, you can ignore it: nothing happens unless you sign in.",
    "",
    "Linkleap",
  ].join("\n");
  const html = simpleHtmlMail({
    paragraphs: [
      `Hello ${escapeHtml(d.displayName)},`,
      `${escapeHtml(who)} to use Linkleap at <strong>${escapeHtml(d.schoolName)}</strong>, as ${escapeHtml(where)}.`,
      `Open the link below and sign in with your school account, <strong>${escapeHtml(d.to)}</strong>.`,
    ],
    link: { href: d.link, label: "Accept the invitation and sign in" },
    smallPrint: [
      `The link works once, until ${escapeHtml(expires)}. If it has run out, ask your school admin to send a new one.`,
      `If the button does not work, copy this address into your browser: ${escapeHtml(d.link)}`,
      "If you were not expecting this message, you can ignore it: nothing happens unless you sign in.",
    ],
  });
  return { to: d.to, subject: `Your invitation to Linkleap at ${d.schoolName}`, text, html };
}
