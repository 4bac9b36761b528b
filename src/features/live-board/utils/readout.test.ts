import { describe, expect, it } from "vitest";
import { perSi, threeFigures, withUncertainty } from "./readout";

describe("readouts", () => {
  it("keeps three significant figures", () => {
    expect(threeFigures(0.12345)).toBe("0.123");
    expect(threeFigures(12.345)).toBe("12.3");
    expect(threeFigures(1234.5)).toBe("1235");
    expect(threeFigures(Number.NaN)).toBe("–");
  });
  it("shows the uncertainty to the value's decimal places, with the unit", () => {
    expect(withUncertainty(13.61, 0.42, "cm")).toBe("13.6 ± 0.4 cm");
    expect(withUncertainty(0.136, null, "")).toBe("0.136");
  });
  it("converts SI to the question's unit", () => {
    expect(perSi("m", "cm")).toBe(100);
    expect(perSi("N", "mN")).toBe(1000);
    expect(perSi("m/s", "furlong")).toBe(1);
  });
});
