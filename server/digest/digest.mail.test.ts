import { describe, expect, it } from "vitest";
import { weeklyDigestMail } from "./digest.mail";
import { reportedWeek } from "./digest.service";

describe("weekly digest", () => {
  it("reports the whole previous week, Monday to Monday, in the school's days", () => {
    // 2026-12-02 is a Wednesday.
    expect(reportedWeek(new Date("2026-12-02T10:00:00Z"), "Europe/London")).toEqual({ startDay: "2026-11-23", endDay: "2026-11-30" });
    // On a Monday morning it is the week that just ended.
    expect(reportedWeek(new Date("2026-11-30T07:00:00Z"), "Europe/London").startDay).toBe("2026-11-23");
    // On a Sunday, the week before the current one.
    expect(reportedWeek(new Date("2026-11-29T23:00:00Z"), "Europe/London").startDay).toBe("2026-11-16");
    // Sunday 23:30 UTC is already Monday morning in New Zealand (UTC+13 in November; IANA tz database).
    expect(reportedWeek(new Date("2026-11-29T23:30:00Z"), "Pacific/Auckland").startDay).toBe("2026-11-23");
  });

  it("adds up lessons, trials and pupils per teacher and class", () => {
    const mail = weeklyDigestMail({
      to: "head@school.example",
      headName: "Mx Head",
      departmentName: "Science",
      schoolName: "Example School",
      weekStart: "2026-11-23",
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
      weekStart: "2026-11-23",
      rows: [],
      overviewUrl: "https://x.example/department",
    });
    expect(mail.text).toContain("Science ran no live lessons in the week of 23 November 2026.");
  });
});
