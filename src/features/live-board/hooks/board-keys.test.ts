import { describe, expect, it } from "vitest";
import { boardActionFor, isTypingTarget } from "./board-keys";

const el = (tagName: string, attrs: Record<string, string> = {}) => ({ tagName, getAttribute: (n: string) => attrs[n] ?? null });
const paused = { paused: true };
const playing = { paused: false };

describe("the board's keys", () => {
  it("maps the teacher's keys to actions", () => {
    expect(boardActionFor({ key: "n" }, playing)).toBe("next-phase");
    expect(boardActionFor({ key: "R" }, playing)).toBe("run");
    expect(boardActionFor({ key: " " }, playing)).toBe("toggle-play");
    expect(boardActionFor({ key: "s" }, playing)).toBe("toggle-slow");
    expect(boardActionFor({ key: "Home" }, playing)).toBe("replay");
    expect(boardActionFor({ key: "0" }, playing)).toBe("replay");
    expect(boardActionFor({ key: "?" }, playing)).toBe("help");
    expect(boardActionFor({ key: "x" }, playing)).toBeNull();
  });

  it("arrows step through the run while paused; → moves the phase on otherwise", () => {
    expect(boardActionFor({ key: "ArrowRight" }, paused)).toBe("forward");
    expect(boardActionFor({ key: "ArrowLeft" }, paused)).toBe("back");
    expect(boardActionFor({ key: "ArrowRight" }, playing)).toBe("next-phase");
    expect(boardActionFor({ key: "ArrowLeft" }, playing)).toBeNull();
  });

  it("never takes keys typed into a field, a slider, or with Ctrl, Cmd or Alt", () => {
    expect(boardActionFor({ key: "n", target: el("INPUT") }, playing)).toBeNull();
    expect(boardActionFor({ key: "s", target: el("textarea") }, playing)).toBeNull();
    expect(boardActionFor({ key: "ArrowLeft", target: el("DIV", { role: "slider" }) }, paused)).toBeNull();
    expect(boardActionFor({ key: "r", ctrlKey: true }, playing)).toBeNull();
    expect(boardActionFor({ key: "r", metaKey: true }, playing)).toBeNull();
    expect(boardActionFor({ key: " ", target: el("BUTTON") }, playing)).toBeNull();
    expect(boardActionFor({ key: "r", target: el("BUTTON") }, playing)).toBe("run");
  });

  it("knows a typing target from a plain element", () => {
    expect(isTypingTarget(el("SELECT"))).toBe(true);
    expect(isTypingTarget(el("DIV"))).toBe(false);
    expect(isTypingTarget(null)).toBe(false);
  });
});
