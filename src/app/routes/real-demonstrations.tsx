import { ButtonLink } from "@/components/ui/button";
import { ArrowLeftIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { Section } from "@/components/ui/section";
import { SafetyCard } from "@/components/safety/safety-card";
import { useDocumentTitle } from "@/hooks/use-document-title";

export function Component() {
  useDocumentTitle("Real demonstrations");
  return (
    <>
      <ButtonLink to="/" variant="quiet" icon={<ArrowLeftIcon />} className="-ml-3">
        Home
      </ButtonLink>
      <PageHeader
        className="mt-2"
        eyebrow="Guide"
        title="Real demonstrations"
        description="Running a real chain in front of the class, safely, alongside the simulation."
      />
      <div className="grid max-w-prose gap-6">
        <SafetyCard />
        <Section title="Real run or simulation?">
          <div className="grid gap-3">
            <p>
              A real run is short and hard to measure, but pupils remember it. A modest height, a table top or a lab bench, is
              plenty to show a chain leaping out of its container.
            </p>
            <p>
              Ask for predictions first, then run it. For anything taller, or to change one setting at a time and compare
              results, use the simulation: it can be run again as often as the class needs, at any height, with nobody near a
              falling chain.
            </p>
          </div>
        </Section>
      </div>
    </>
  );
}
