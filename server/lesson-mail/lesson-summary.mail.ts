import type { OutgoingMail } from "../mail/mailer";
import { escapeHtml, simpleHtmlMail } from "../mail/html";

/** One trial of the lesson, as the summary reports it: counts and class figures, never pupils. */
export interface SummaryTrial {
  position: number;
  rigName: string;
  prompt: string;
  unit: string;
  answerCount: number;
  /** Median of the class's first answers, in the question's unit (null for choice questions or none). */
  medianAnswer: number | null;
  result: number | null;
  theory: number | null;
}

export interface LessonSummaryDetails {
  to: string;
  teacherName: string;
  className: string;
  startedAt: Date;
  endedAt: Date;
  /** The school's time zone: the start time is given in it. */
  timeZone: string;
  participantCount: number;
  trials: SummaryTrial[];
  reviewUrl: string;
}

const formatWhen = (date: Date, timeZone: string) =>
  date.toLocaleString("en-GB", { weekday: "long", day: "numeric", month: "long", hour: "2-digit", minute: "2-digit", timeZone });

/** Three significant figures, as the board shows them. */
const figure = (value: number | null, unit: string) =>
  value === null || !Number.isFinite(value) ? "–" : `${Number(value.toPrecision(3))}${unit ? ` ${unit}` : ""}`;

const minutesBetween = (a: Date, b: Date) => Math.max(1, Math.round((b.getTime() - a.getTime()) / 60_000));

/**
 * The message a teacher gets when a live lesson ends: what was run, how many took part, the
 * class's median beside the result and the theory, and a link to the review. Counts and class
 * figures only — no pupil's name or answer goes in an e-mail.
 */
export function lessonSummaryMail(d: LessonSummaryDetails): OutgoingMail {
  const trialsRun = d.trials.filter((t) => t.result !== null).length;
  const headline = `${d.className}: ${d.trials.length} trial${d.trials.length === 1 ? "" : "s"} (${trialsRun} run), ${d.participantCount} pupil${d.participantCount === 1 ? "" : "s"} took part, ${minutesBetween(d.startedAt, d.endedAt)} minutes.`;
  const trialLine = (t: SummaryTrial) =>
    `Trial ${t.position}, ${t.rigName}: ${t.prompt} ${t.answerCount} answer${t.answerCount === 1 ? "" : "s"}; class median ${figure(t.medianAnswer, t.unit)}; simulation ${figure(t.result, t.unit)}; theory ${figure(t.theory, t.unit)}.`;
  const text = [
    `Hello ${d.teacherName},`,
    "",
    `Your live lesson started ${formatWhen(d.startedAt, d.timeZone)} has ended.`,
    headline,
    "",
    ...(d.trials.length ? d.trials.map(trialLine) : ["No trials were set up."]),
    "",
    "Review the lesson, with every answer, on its page:",
    d.reviewUrl,
    "",
    "This message holds class totals only. Pupils' names and answers stay in Linkleap.",
    "",
    "Linkleap",
  ].join("\n");
  const html = simpleHtmlMail({
    paragraphs: [
      `Hello ${escapeHtml(d.teacherName)},`,
      `Your live lesson started ${escapeHtml(formatWhen(d.startedAt, d.timeZone))} has ended. ${escapeHtml(headline)}`,
      ...(d.trials.length ? d.trials.map((t) => escapeHtml(trialLine(t))) : ["No trials were set up."]),
    ],
    link: { href: d.reviewUrl, label: "Review the lesson" },
    smallPrint: [
      `If the button does not work, copy this address into your browser: ${escapeHtml(d.reviewUrl)}`,
      "This message holds class totals only. Pupils' names and answers stay in Linkleap.",
    ],
  });
  return { to: d.to, subject: `Lesson summary: ${d.className}`, text, html };
}
