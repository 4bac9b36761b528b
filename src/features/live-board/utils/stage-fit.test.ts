import { describe, expect, it } from "vitest";
import { fitView, formatHeight, highestPoint } from "./stage-fit";

const none = { left: 0, right: 0, top: 0, bottom: 0 };

describe("fitting the scene into the stage", () => {
  it("fills the limiting direction and turns y up into screen y down", () => {
    // 1 m wide, 2 m tall into 400 × 400: height limits, 200 px per metre, centred across.
    const fit = fitView([0, 0, 1, 2], 400, 400, none);
    expect(fit.scale).toBe(200);
    expect(fit.y(2)).toBe(0);
    expect(fit.y(0)).toBe(400);
    expect(fit.x(0)).toBe(100);
    expect(fit.x(1)).toBe(300);
  });

  it("keeps the margins free", () => {
    const fit = fitView([-1, 0, 1, 1], 500, 300, { left: 100, right: 0, top: 50, bottom: 50 });
    // room 400 × 200 for 2 m × 1 m: 200 px per metre either way.
    expect(fit.scale).toBe(200);
    expect(fit.x(-1)).toBe(100);
    expect(fit.y(1)).toBe(50);
    expect(fit.y(0)).toBe(250);
  });
});

describe("the chain's highest point", () => {
  it("skips hidden (NaN) elements", () => {
    const frame = new Float32Array([0, 0.5, 0, Number.NaN, Number.NaN, Number.NaN, 1, 1.25, 0]);
    expect(highestPoint(frame)).toBe(1.25);
  });
  it("is null when nothing is drawn", () => {
    expect(highestPoint(new Float32Array([Number.NaN, Number.NaN, Number.NaN]))).toBeNull();
  });
  it("labels heights in cm below a metre and m above", () => {
    expect(formatHeight(0.354)).toBe("35 cm");
    expect(formatHeight(1.234)).toBe("1.23 m");
    // A float32 height just under a metre reads as a metre, not "100 cm".
    expect(formatHeight(Math.fround(0.99999))).toBe("1.00 m");
  });
});
