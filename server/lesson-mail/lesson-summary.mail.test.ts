import { describe, expect, it } from "vitest";
import { lessonSummaryMail, type LessonSummaryDetails } from "./lesson-summary.mail";

const details: LessonSummaryDetails = {
  to: "teacher@school.example",
  teacherName: "Ms Example",
  className: "10P <Physics>",
  startedAt: new Date("2026-11-30T09:00:00Z"),
  endedAt: new Date("2026-11-30T09:48:00Z"),
  timeZone: "Europe/London",
  participantCount: 27,
  trials: [
    { position: 1, rigName: "Fountain rig", prompt: "How high?", unit: "cm", answerCount: 25, medianAnswer: 12.25, result: 14.31, theory: 13.6 },
    { position: 2, rigName: "Scale rig", prompt: "How many times?", unit: "", answerCount: 0, medianAnswer: null, result: null, theory: 3 },
  ],
  reviewUrl: "https://linkleap.school.example/lessons/abc/review",
};

describe("lesson summary e-mail", () => {
  it("gives counts, the class median, the result and the theory, and the review link", () => {
    const mail = lessonSummaryMail(details);
    expect(mail.subject).toBe("Lesson summary: 10P <Physics>");
    expect(mail.text).toContain("2 trials (1 run), 27 pupils took part, 48 minutes.");
    expect(mail.text).toContain("Trial 1, Fountain rig: How high? 25 answers; class median 12.3 cm; simulation 14.3 cm; theory 13.6 cm.");
    expect(mail.text).toContain("Trial 2, Scale rig: How many times? 0 answers; class median –; simulation –; theory 3.");
    expect(mail.text).toContain(details.reviewUrl);
    expect(mail.html).toContain('href="https://linkleap.school.example/lessons/abc/review"');
  });

  it("gives the start in the school's time zone (London is on BST, UTC+1, in June)", () => {
    expect(lessonSummaryMail(details).text).toContain("started Monday 30 November at 09:00 has ended");
    const june = lessonSummaryMail({ ...details, startedAt: new Date("2026-06-15T08:30:00Z"), endedAt: new Date("2026-06-15T09:20:00Z") });
    expect(june.text).toContain("started Monday 15 June at 09:30 has ended");
  });

  it("escapes what staff typed in the HTML part", () => {
    const { html } = lessonSummaryMail(details);
    expect(html).toContain("10P &lt;Physics&gt;");
    expect(html).not.toContain("10P <Physics>");
  });
});
