import { Section } from "@/components/ui/section";
import { ClockIcon } from "@/components/ui/icons";

/**
 * Live lessons arrive in a later release; until then this section says plainly that there are
 * none, rather than showing a made-up list.
 */
export function RecentLessons() {
  return (
    <Section title="Recent lessons">
      <div className="flex items-start gap-3 rounded-control border-2 border-dashed border-line px-4 py-5">
        <ClockIcon className="mt-0.5 size-6 text-ink-muted" />
        <p>No lessons yet. Lessons you run will be listed here.</p>
      </div>
    </Section>
  );
}
