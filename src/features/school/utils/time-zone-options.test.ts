import { describe, expect, it } from "vitest";
import { timeZoneGroups } from "./time-zone-options";

describe("the time zone picker's options", () => {
  it("groups zones by region with readable place names, UTC first", () => {
    const groups = timeZoneGroups("Europe/London", ["Europe/London", "America/Argentina/Buenos_Aires", "Europe/Isle_of_Man", "UTC"]);
    expect(groups).toEqual([
      { region: "Universal", zones: [{ value: "UTC", label: "UTC" }] },
      { region: "America", zones: [{ value: "America/Argentina/Buenos_Aires", label: "Argentina, Buenos Aires (America)" }] },
      {
        region: "Europe",
        zones: [
          { value: "Europe/Isle_of_Man", label: "Isle of Man (Europe)" },
          { value: "Europe/London", label: "London (Europe)" },
        ],
      },
    ]);
  });

  it("keeps the school's current zone even when the browser does not list it", () => {
    const values = timeZoneGroups("Asia/Kolkata", ["Asia/Calcutta"]).flatMap((g) => g.zones.map((z) => z.value));
    expect(values).toEqual(["UTC", "Asia/Calcutta", "Asia/Kolkata"]);
  });
});
