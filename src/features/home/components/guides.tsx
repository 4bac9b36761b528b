import { Link } from "react-router";
import { ChevronRightIcon, LockIcon, WarnIcon } from "@/components/ui/icons";
import { Section } from "@/components/ui/section";

const GUIDES = [
  {
    to: "/help/real-demonstrations",
    title: "Real demonstrations",
    note: "The safety card for running a real chain in class.",
    icon: WarnIcon,
  },
  {
    to: "/privacy",
    title: "Pupil data and privacy",
    note: "What Linkleap stores about pupils, and for how long.",
    icon: LockIcon,
  },
] as const;

/** Short guides a teacher may need before a lesson. */
export function Guides() {
  return (
    <Section title="Guides">
      <ul className="grid gap-2">
        {GUIDES.map(({ to, title, note, icon: Icon }) => (
          <li key={to}>
            <Link to={to} className="flex min-h-touch items-start gap-3 rounded-control px-2 py-2 no-underline hover:bg-sunken">
              <Icon className="mt-1 size-5 text-accent" />
              <span className="min-w-0 flex-1">
                <span className="block font-bold text-accent">{title}</span>
                <span className="block text-sm text-ink-muted">{note}</span>
              </span>
              <ChevronRightIcon className="mt-1 size-5 text-ink-muted" />
            </Link>
          </li>
        ))}
      </ul>
    </Section>
  );
}
