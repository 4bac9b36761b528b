import { PNG } from "pngjs";
import { describe, expect, it } from "vitest";
import { measurePhoto, type PhotoMark, type PhotoMarks } from "./photo-measure";

describe("measurePhoto: the scale maths, worked by hand", () => {
  it("turns pixel marks into metres", () => {
    // Reference 0.50 m spans 200 px (ends at (100, 700) and (220, 860): √(120² + 160²) = 200 px)
    //   → scale = 0.50 m / 200 px = 0.0025 m/px = 2.5 mm/px.
    // Rim at y = 500, floor at y = 900: 400 px → 400 × 2.5 mm = 1.000 m pot height.
    // Crest at y = 444: 56 px above the rim → 56 × 2.5 mm = 0.140 m rise.
    // (x of rim, crest and floor do not matter: heights are along the image's vertical.)
    const marks: PhotoMarks = {
      rim: { x: 300, y: 500 },
      crest: { x: 340, y: 444 },
      floor: { x: 520, y: 900 },
      referenceStart: { x: 100, y: 700 },
      referenceEnd: { x: 220, y: 860 },
    };
    const result = measurePhoto(marks, 0.5);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.referencePixels).toBeCloseTo(200, 10);
    expect(result.metresPerPixel).toBeCloseTo(0.0025, 12);
    expect(result.potHeightM).toBeCloseTo(1.0, 10);
    expect(result.riseM).toBeCloseTo(0.14, 10);
  });

  it("refuses marks that cannot describe a fountain", () => {
    const base: PhotoMarks = {
      rim: { x: 0, y: 500 },
      crest: { x: 0, y: 450 },
      floor: { x: 0, y: 900 },
      referenceStart: { x: 0, y: 0 },
      referenceEnd: { x: 100, y: 0 },
    };
    expect(measurePhoto({ ...base, floor: { x: 0, y: 400 } }, 0.5)).toMatchObject({ ok: false, problem: "floor_not_below_rim" });
    expect(measurePhoto({ ...base, crest: { x: 0, y: 520 } }, 0.5)).toMatchObject({ ok: false, problem: "crest_below_rim" });
    expect(measurePhoto({ ...base, referenceEnd: { x: 5, y: 5 } }, 0.5)).toMatchObject({ ok: false, problem: "reference_too_short" });
    expect(measurePhoto(base, 0)).toMatchObject({ ok: false, problem: "bad_length" });
  });
});

/** Colours of the marks painted on the synthetic photo. */
const COLOURS: Record<PhotoMark, [number, number, number]> = {
  rim: [230, 30, 30],
  crest: [30, 200, 30],
  floor: [30, 30, 230],
  referenceStart: [230, 0, 230],
  referenceEnd: [240, 200, 0],
};

/**
 * A set-up with known geometry: 1.25 m pot, 0.17 m rise, a 0.30 m ruler lying at an angle,
 * drawn at 320 px per metre (3.125 mm/px), each mark a filled disc of radius 5 px.
 */
function syntheticPhoto() {
  const pxPerM = 320;
  const width = 640;
  const height = 560;
  const floorY = 520;
  const layout = { potHeightM: 1.25, riseM: 0.17, referenceM: 0.3 };
  const angle = Math.atan2(3, 4); // the ruler leans: 4 across for 3 up
  const centres: PhotoMarks = {
    floor: { x: 200, y: floorY },
    rim: { x: 260, y: floorY - layout.potHeightM * pxPerM },
    crest: { x: 300, y: floorY - (layout.potHeightM + layout.riseM) * pxPerM },
    referenceStart: { x: 420, y: 480 },
    referenceEnd: {
      x: 420 + layout.referenceM * pxPerM * Math.cos(angle),
      y: 480 - layout.referenceM * pxPerM * Math.sin(angle),
    },
  };
  const png = new PNG({ width, height });
  png.data.fill(255);
  for (const mark of Object.keys(centres) as PhotoMark[]) {
    const { x: cx, y: cy } = centres[mark];
    for (let y = Math.floor(cy - 6); y <= cy + 6; y++) {
      for (let x = Math.floor(cx - 6); x <= cx + 6; x++) {
        if ((x - cx) ** 2 + (y - cy) ** 2 > 25) continue;
        const i = (y * width + x) * 4;
        png.data.set([...COLOURS[mark], 255], i);
      }
    }
  }
  return { bytes: PNG.sync.write(png), layout };
}

/** Finds each mark's centre as the mean position of the pixels of its colour. */
function findMarks(bytes: Buffer): PhotoMarks {
  const png = PNG.sync.read(bytes);
  const sums = new Map<PhotoMark, { x: number; y: number; n: number }>();
  for (let y = 0; y < png.height; y++) {
    for (let x = 0; x < png.width; x++) {
      const i = (y * png.width + x) * 4;
      const rgb = [png.data[i], png.data[i + 1], png.data[i + 2]];
      for (const [mark, colour] of Object.entries(COLOURS) as [PhotoMark, number[]][]) {
        if (colour.every((c, k) => c === rgb[k])) {
          const s = sums.get(mark) ?? { x: 0, y: 0, n: 0 };
          sums.set(mark, { x: s.x + x, y: s.y + y, n: s.n + 1 });
        }
      }
    }
  }
  const out = {} as PhotoMarks;
  for (const mark of Object.keys(COLOURS) as PhotoMark[]) {
    const s = sums.get(mark);
    if (!s) throw new Error(`mark ${mark} not found in the image`);
    out[mark] = { x: s.x / s.n, y: s.y / s.n };
  }
  return out;
}

describe("measurePhoto on a synthetic photo with known geometry", () => {
  it("gives back the pot height and rise the picture was drawn with", () => {
    const { bytes, layout } = syntheticPhoto();
    const marks = findMarks(bytes);
    const result = measurePhoto(marks, layout.referenceM);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    // Pixel centroids of discs on a grid are within a fraction of a pixel (3 mm per px here).
    expect(result.potHeightM).toBeCloseTo(layout.potHeightM, 2);
    expect(result.riseM).toBeCloseTo(layout.riseM, 2);
    expect(Math.abs(result.potHeightM - layout.potHeightM)).toBeLessThan(0.005);
    expect(Math.abs(result.riseM - layout.riseM)).toBeLessThan(0.005);
  });
});
