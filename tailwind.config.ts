import type { Config } from "tailwindcss";
import plugin from "tailwindcss/plugin";

/**
 * Linkleap's design tokens. Colours are named by role, never by hue, and each role has a
 * value in both themes: `work` (light, for planning at a desk) and `board` (dark, for the
 * projector). Components only ever use the role names (`bg-paper`, `text-ink`, `ring-focus`),
 * so a subtree switches theme with `data-theme="board"`.
 *
 * Contrast (WCAG 2.x ratios, checked for both themes): text roles (`ink`, `ink-muted`, `accent`,
 * `danger`, `ok`, `warn`) are at least 5.4:1 on `paper`, `surface`, `sunken` and their own
 * `-soft` tint; `line-strong` (control borders) and `focus` are at least 3.6:1 on every
 * background. The hues (blue accent, brick red, teal green, amber) stay apart for the common
 * colour-vision deficiencies, and no state is ever shown by colour alone: there is always an
 * icon or a word as well.
 */
export const themes = {
  work: {
    paper: "#F7F5F0",
    surface: "#FFFFFF",
    sunken: "#EEEBE4",
    ink: "#1A1F29",
    "ink-muted": "#4B5262",
    line: "#D8D3C8",
    "line-strong": "#737A88",
    accent: "#0B5C8E",
    "accent-strong": "#084569",
    "on-accent": "#FFFFFF",
    "accent-soft": "#E3EEF6",
    danger: "#A8321C",
    "danger-strong": "#852614",
    "danger-soft": "#FBE9E4",
    ok: "#0D6B52",
    "ok-soft": "#E1F2EC",
    warn: "#7A4E00",
    "warn-soft": "#FCF0D4",
    focus: "#C2570C",
  },
  board: {
    paper: "#0F1522",
    surface: "#182134",
    sunken: "#0A0F19",
    ink: "#F4F1E8",
    "ink-muted": "#B9C0CD",
    line: "#2C3850",
    "line-strong": "#8792A8",
    accent: "#7CC3F2",
    "accent-strong": "#A6D7F7",
    "on-accent": "#0A1624",
    "accent-soft": "#1B3147",
    danger: "#FF9B7A",
    "danger-strong": "#FFB9A1",
    "danger-soft": "#3A1F1A",
    ok: "#5CD1AC",
    "ok-soft": "#143329",
    warn: "#F2C35B",
    "warn-soft": "#33290F",
    focus: "#FFD23F",
  },
} as const;

export type ColourRole = keyof (typeof themes)["work"];

const roles = Object.keys(themes.work) as ColourRole[];
const cssVariables = (theme: keyof typeof themes) =>
  Object.fromEntries(roles.map((role) => [`--ll-${role}`, themes[theme][role]]));

export default {
  content: ["./index.html", "./src/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: Object.fromEntries(roles.map((role) => [role, `var(--ll-${role})`])),
      fontFamily: {
        sans: ['"Atkinson Hyperlegible Next"', "system-ui", "sans-serif"],
        mono: ['"Atkinson Hyperlegible Mono"', "ui-monospace", "monospace"],
      },
      borderRadius: {
        control: "0.5rem",
        card: "0.875rem",
      },
      minHeight: {
        // The smallest touch target we allow (WCAG 2.2 target size, and our own 44 px rule).
        touch: "2.75rem",
      },
      minWidth: {
        touch: "2.75rem",
      },
      maxWidth: {
        page: "72rem",
        prose: "40rem",
      },
      boxShadow: {
        card: "0 1px 2px rgb(20 24 33 / 0.06), 0 2px 8px rgb(20 24 33 / 0.05)",
        lifted: "0 8px 30px rgb(20 24 33 / 0.18)",
      },
    },
  },
  plugins: [
    plugin(({ addBase }) => {
      addBase({
        ":root": { ...cssVariables("work"), colorScheme: "light" },
        '[data-theme="board"]': { ...cssVariables("board"), colorScheme: "dark" },
      });
    }),
  ],
} satisfies Config;
