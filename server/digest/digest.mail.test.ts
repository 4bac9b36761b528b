import { describe, expect, it } from "vitest";
import { weeklyDigestMail } from "./digest.mail";
import { reportedWeek } from "./digest.service";

describe("weekly digest", () => {
  it("reports the whole previous week, Monday to Monday (UTC)", () => {
    // 2026-12-02 is a Wednesday.
    const { start, end } = reportedWeek(new Date("2026-12-02T10:00:00Z"));
    expect(start.toISOString()).toBe("2026-11-23T00:00:00.000Z");
    expect(end.toISOString()).toBe("2026-11-30T00:00:00.000Z");
    // On a Monday morning it is the week that just ended.
    expect(reportedWeek(new Date("2026-11-30T07:00:00Z")).start.toISOString()).toBe("2026-11-23T00:00:00.000Z");
    // On a Sunday, the week before the current one.
    expect(reportedWeek(new Date("2026-11-29T23:00:00Z")).start.toISOString()).toBe("2026-11-16T00:00:00.000Z");
  });

  it("adds up lessons, trials and pupils per teacher and class", () => {
    const mail = weeklyDigestMail({
      to: "head@school.example",
      headName: "Mx Head",
      departmentName: "Science",
      schoolName: "Example School",
      weekStart: new Date("2026-11-23T00:00:00Z"),
      rows: [
        { teacherName: "T One", className: "10P", lessons: 2, trialsRun: 5, pupils: 50 },
        { teacherName: "T Two", className: "12A", lessons: 1, trialsRun: 1, pupils: 1 },
      ],
      overviewUrl: "https://x.example/department",
    });
    expect(mail.subject).toBe("Linkleap weekly: Science, week of 23 November 2026");
    expect(mail.text).toContain("Science ran 3 live lessons in the week of 23 November 2026: 6 trials run, 51 pupil places taken.");
    expect(mail.text).toContain("T Two, 12A: 1 lesson, 1 trial run, 1 pupil taking part.");
  });

  it("says plainly when there were no lessons", () => {
    const mail = weeklyDigestMail({
      to: "h@x.example",
      headName: "H",
      departmentName: "Science",
      schoolName: "S",
      weekStart: new Date("2026-11-23T00:00:00Z"),
      rows: [],
      overviewUrl: "https://x.example/department",
    });
    expect(mail.text).toContain("Science ran no live lessons in the week of 23 November 2026.");
  });
});
