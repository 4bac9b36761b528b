import { describe, expect, it } from "vitest";
import type { ClassSummary } from "@contracts/classes";
import { groupByTeacher } from "./group-by-teacher";

const teacher = (id: string, displayName: string) => ({ id, displayName });
const tom = teacher("t-tom", "Tom Ashdown");
const priya = teacher("t-priya", "Priya Lindqvist");
const helen = teacher("t-helen", "Helen Marrable");

const cls = (id: string, name: string, t: { id: string; displayName: string }): ClassSummary => ({
  id,
  name,
  yearGroup: "Year 10",
  subject: "Physics",
  archivedAt: null,
  createdAt: "2025-01-01T00:00:00.000Z",
  updatedAt: "2025-01-01T00:00:00.000Z",
  teacher: t,
  rosterCount: 0,
  access: "department",
});

describe("groupByTeacher", () => {
  const classes = [cls("1", "10A Physics", tom), cls("2", "11C Science", priya), cls("3", "9B Physics", tom), cls("4", "12 Physics", helen)];

  it("puts each teacher's classes together, classes in natural name order", () => {
    const groups = groupByTeacher(classes);
    expect(groups.map((g) => g.teacher.displayName)).toEqual(["Helen Marrable", "Priya Lindqvist", "Tom Ashdown"]);
    expect(groups[2]!.classes.map((c) => c.name)).toEqual(["9B Physics", "10A Physics"]);
  });

  it("lists the viewer's own classes first", () => {
    expect(groupByTeacher(classes, "t-tom").map((g) => g.teacher.displayName)).toEqual([
      "Tom Ashdown",
      "Helen Marrable",
      "Priya Lindqvist",
    ]);
  });

  it("gives no groups for no classes", () => {
    expect(groupByTeacher([])).toEqual([]);
  });
});
