import { PageHeader } from "@/components/ui/page-header";
import { PrivacyStatement } from "@/features/pupil-data/components/privacy-statement";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { useMe } from "../use-me";

/** For every member of staff: what Linkleap stores about pupils and for how long. */
export function Component() {
  useDocumentTitle("Pupil data and privacy");
  const me = useMe();
  return (
    <>
      <PageHeader
        eyebrow={me.school.name}
        title="Pupil data and privacy"
        description="What Linkleap stores about pupils, why, for how long, and who can see it. Pupils have no accounts."
      />
      <PrivacyStatement />
    </>
  );
}
