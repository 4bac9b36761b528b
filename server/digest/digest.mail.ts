import { parseIsoDay } from "../contracts/department-overview";
import type { OutgoingMail } from "../mail/mailer";
import { escapeHtml, simpleHtmlMail } from "../mail/html";

/** One teacher and class in the week: totals only. */
export interface DigestRow {
  teacherName: string;
  className: string;
  lessons: number;
  trialsRun: number;
  pupils: number;
}

export interface DigestDetails {
  to: string;
  headName: string;
  departmentName: string;
  schoolName: string;
  /** The Monday the week reported starts on, a calendar day in the school's time zone ("2026-11-23"). */
  weekStart: string;
  rows: DigestRow[];
  overviewUrl: string;
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
// A calendar day, so formatted at its own UTC midnight.
const formatDay = (day: string) => parseIsoDay(day)!.toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });

/**
 * The head of department's weekly digest: lessons per teacher and class, trials run and pupils
 * taking part. Totals only — no pupil's name or answer is ever in it.
 */
export function weeklyDigestMail(d: DigestDetails): OutgoingMail {
  const lessons = d.rows.reduce((sum, r) => sum + r.lessons, 0);
  const trialsRun = d.rows.reduce((sum, r) => sum + r.trialsRun, 0);
  const pupils = d.rows.reduce((sum, r) => sum + r.pupils, 0);
  const week = `the week of ${formatDay(d.weekStart)}`;
  const headline = lessons
    ? `${d.departmentName} ran ${plural(lessons, "live lesson")} in ${week}: ${plural(trialsRun, "trial")} run, ${plural(pupils, "pupil place")} taken.`
    : `${d.departmentName} ran no live lessons in ${week}.`;
  const line = (r: DigestRow) =>
    `${r.teacherName}, ${r.className}: ${plural(r.lessons, "lesson")}, ${plural(r.trialsRun, "trial")} run, ${plural(r.pupils, "pupil")} taking part.`;
  const text = [
    `Hello ${d.headName},`,
    "",
    headline,
    "",
    ...d.rows.map(line),
    ...(d.rows.length ? [""] : []),
    "The department overview has the detail:",
    d.overviewUrl,
    "",
    `Totals only: pupils' names and answers are not in this message. ${d.schoolName}, Linkleap.`,
  ].join("\n");
  const html = simpleHtmlMail({
    paragraphs: [`Hello ${escapeHtml(d.headName)},`, escapeHtml(headline), ...d.rows.map((r) => escapeHtml(line(r)))],
    link: { href: d.overviewUrl, label: "Open the department overview" },
    smallPrint: [
      `If the button does not work, copy this address into your browser: ${escapeHtml(d.overviewUrl)}`,
      `Totals only: pupils' names and answers are not in this message. ${escapeHtml(d.schoolName)}, Linkleap.`,
    ],
  });
  return { to: d.to, subject: `Linkleap weekly: ${d.departmentName}, week of ${formatDay(d.weekStart)}`, text, html };
}
