import { describe, expect, it } from "vitest";
import { CALIBRATED_PILE_NOTE, ROD_KICK_MODEL_NOTE, TYPICAL_ALPHA_NOTE } from "./theory-notes";
import { TYPICAL_ALPHA } from "./fountain";

describe("notes shown with theory and simulated values", () => {
  it("says the pile is calibrated against measurements while the mechanism emerges", () => {
    expect(CALIBRATED_PILE_NOTE).toMatch(/measured/);
    expect(CALIBRATED_PILE_NOTE).toMatch(/rods rise/);
    expect(CALIBRATED_PILE_NOTE).toMatch(/beads on floppy threads do not/);
    expect(CALIBRATED_PILE_NOTE).toMatch(/higher the pot/);
  });

  it("presents the rod-kick explanation as the standard one, not the last word", () => {
    expect(ROD_KICK_MODEL_NOTE).toMatch(/not the final word/);
  });

  it("quotes the default push coefficient the code actually uses", () => {
    expect(TYPICAL_ALPHA_NOTE).toContain(String(TYPICAL_ALPHA));
  });
});
