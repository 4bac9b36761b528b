/**
 * The demo school. Every school, person and class here is invented; the `.example`
 * domain is reserved for examples (RFC 2606), so no address can reach anyone.
 */
import type { StaffRole } from "../../contracts/staff-roles";

export const DEMO_SCHOOL = { name: "Brackenfold Academy", department: "Science" } as const;

export interface DemoStaff {
  key: "head" | "teacherA" | "teacherB" | "admin";
  displayName: string;
  email: string;
  role: StaffRole;
  inDepartment: boolean;
  note: string;
}

export const DEMO_STAFF: readonly DemoStaff[] = [
  { key: "teacherA", displayName: "Tom Ashdown", email: "tom.ashdown@brackenfold.example", role: "teacher", inDepartment: true, note: "Physics teacher" },
  { key: "teacherB", displayName: "Priya Lindqvist", email: "priya.lindqvist@brackenfold.example", role: "teacher", inDepartment: true, note: "Science teacher" },
  { key: "head", displayName: "Helen Marrable", email: "helen.marrable@brackenfold.example", role: "head_of_department", inDepartment: true, note: "Head of science" },
  { key: "admin", displayName: "Gareth Pell", email: "gareth.pell@brackenfold.example", role: "admin", inDepartment: false, note: "School admin" },
];

/** Listed on the local sign-in page to show what an uninvited person sees. */
export const DEMO_UNINVITED = { name: "Sam Reed", email: "sam.reed@elsewhere.example", note: "Not invited to the school" } as const;

const FIRST_NAMES = [
  "Aisha", "Ben", "Callum", "Dara", "Elif", "Finn", "Grace", "Hamza", "Isla", "Jonah", "Kiran", "Lena",
  "Malik", "Nell", "Oscar", "Piper", "Quinn", "Rosa", "Sami", "Tegan", "Umar", "Vera", "Wren", "Yusuf",
  "Zara", "Alfie", "Bea", "Cyrus", "Delia", "Ezra", "Freya", "Gus",
];
const INITIALS = "ABCDEFGHJKLMNPRSTW";

/** A roster of `size` invented display names, different for each `offset`. */
function roster(size: number, offset: number): string[] {
  return Array.from({ length: size }, (_, i) => {
    const first = FIRST_NAMES[(i * 7 + offset) % FIRST_NAMES.length]!;
    const initial = INITIALS[(i * 5 + offset * 3) % INITIALS.length]!;
    return `${first} ${initial}.`;
  }).filter((name, i, all) => all.indexOf(name) === i);
}

export const DEMO_CLASSES = [
  { teacher: "teacherA", name: "10A Physics", yearGroup: "Year 10", subject: "Physics", roster: roster(26, 0) },
  { teacher: "teacherA", name: "12 Physics, set 1", yearGroup: "Year 12", subject: "Physics", roster: roster(14, 5) },
  { teacher: "teacherB", name: "11C Combined Science", yearGroup: "Year 11", subject: "Combined science", roster: roster(28, 11) },
] as const satisfies readonly { teacher: DemoStaff["key"]; name: string; yearGroup: string; subject: string; roster: string[] }[];

/**
 * Example real runs for the demo's Year 12 class, so its "Real runs" graph is not empty.
 * Invented numbers, labelled as such in their note; not measurements.
 */
export const DEMO_BENCH_RUNS = {
  className: "12 Physics, set 1",
  runs: [
    { potHeightM: 0.6, riseM: 0.07, speedMps: 2.6, heightUnit: "cm" },
    { potHeightM: 0.9, riseM: 0.1, speedMps: null, heightUnit: "cm" },
    { potHeightM: 1.2, riseM: 0.15, speedMps: 3.7, heightUnit: "cm" },
  ],
  note: "Example run invented for the demo",
} as const;

/**
 * One finished live lesson for the Year 12 class, so its lesson list, the review and the
 * comparison graphs have something to show. The pupils' answers, reasons and explanations are
 * invented for the demo. The results are the simulation's own figures for these set-ups (the
 * calibration table in DEVELOPERS.md, "Simulation"), not measurements of a real chain.
 */
export const DEMO_PAST_LESSON = {
  className: "12 Physics, set 1",
  daysAgo: 7,
  minutes: 48,
  code: "HKT4MP",
  trials: [
    {
      potHeight: 1,
      rise: { value: 0.143, uncertainty: 0.008 },
      // Answers in cm, one per pupil in roster order; null: that pupil did not answer.
      answers: [5, 12, 0, 20, 15, 8, 10, null, 25, 14, 6, 30],
      revote: null,
    },
    {
      potHeight: 1.5,
      rise: { value: 0.227, uncertainty: 0.012 },
      answers: [10, 18, 20, 30, 22, 15, 21, null, 35, 20, 12, 40],
      revote: [20, 20, 22, 25, 22, 18, 21, null, 30, 21, 20, 24],
    },
  ],
  reasons: [
    "The pot pushes the chain up as it is pulled out.",
    "It drops further so it goes faster.",
    "",
    "I think it just falls over the edge.",
  ],
  explanations: [
    { pupil: 1, text: "The links are yanked up off the pile, so the chain has to loop above the rim before it can fall.", shown: true },
    { pupil: 3, text: "A taller drop makes the chain faster, and a faster chain needs a bigger arch.", shown: true },
    { pupil: 6, text: "I was wrong, I thought it would not rise at all.", shown: false },
  ],
} as const;

/**
 * Starter lesson plans, written for the demo and shared with its department by the head of
 * department, so a teacher's plans page has something to start from or duplicate. Each trial is a
 * set-up as the board stores it (rig, parameters, question); anything left out takes the rig's default.
 */
export const DEMO_PLANS = {
  owner: "head" as DemoStaff["key"],
  plans: [
    {
      title: "Does a higher pot make a higher fountain?",
      summary:
        "Three drops of the same rod chain. Pupils predict the rise each time, then look for the pattern: " +
        "does doubling the drop double the rise? If you also show a real chain, follow your school's risk assessment.",
      trials: [0.5, 1, 1.5].map((potHeight) => ({
        rig: "fountain" as const,
        params: { linkShape: "rod", potHeight },
        question: {
          kind: "number" as const,
          prompt: `The pot is ${potHeight} m above the floor. How far above the rim will the chain rise?`,
          quantity: "rise",
          unit: "cm",
          askReason: true,
          askExplanation: potHeight === 1.5,
          revote: false,
        },
      })),
    },
    {
      title: "Rods or beads on a thread?",
      summary:
        "The same drop with two kinds of chain. Stiff rods are kicked upwards as they leave the pile; beads on a " +
        "thread are not. Ask first, run both, then let pupils explain the difference.",
      trials: (["rod", "bead-thread"] as const).map((linkShape) => ({
        rig: "fountain" as const,
        params: { linkShape, potHeight: 1 },
        question: {
          kind: "choice" as const,
          prompt: linkShape === "rod" ? "Rod chain, 1 m drop: will it rise clearly above the rim?" : "Beads on a thread, 1 m drop: will it rise clearly above the rim?",
          quantity: "rise",
          unit: "cm",
          choices: [
            { label: "Yes, by more than 5 cm", min: 5, max: null },
            { label: "A little, 1 to 5 cm", min: 1, max: 5 },
            { label: "Hardly at all, under 1 cm", min: null, max: 1 },
          ],
          askReason: true,
          askExplanation: true,
          revote: linkShape === "bead-thread",
        },
      })),
    },
    {
      title: "A chain falling onto a scale",
      summary:
        "A chain held just above a scale pan is let go. While it falls, does the scale show only the weight of the " +
        "chain already on the pan, or more? A real falling chain is a hazard to feet and fingers: follow your school's risk assessment.",
      trials: [1, 2].map((chainLength) => ({
        rig: "scale" as const,
        params: { linkShape: "rod", chainLength },
        question: {
          kind: "number" as const,
          prompt: `A ${chainLength} m chain falls onto the pan. The scale reads how many times the weight of chain already on it?`,
          quantity: "readingRatio",
          unit: "",
          askReason: true,
          askExplanation: true,
          revote: chainLength === 2,
        },
      })),
    },
  ],
} as const;

/**
 * The demo teacher's next lessons, so home's "Next lessons" has something to start: days ahead of
 * the day the demo is seeded, at a local school time, with one of the starter plans (by index).
 */
export const DEMO_PLANNED_LESSONS = [
  { teacher: "teacherA", className: "10A Physics", planIndex: 0, daysAhead: 1, hour: 9, minute: 5 },
  { teacher: "teacherA", className: "12 Physics, set 1", planIndex: 1, daysAhead: 2, hour: 13, minute: 40 },
] as const satisfies readonly { teacher: DemoStaff["key"]; className: string; planIndex: number; daysAhead: number; hour: number; minute: number }[];
