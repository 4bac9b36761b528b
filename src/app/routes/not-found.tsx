import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { useDocumentTitle } from "@/hooks/use-document-title";

export function Component() {
  useDocumentTitle("Page not found");
  return (
    <div className="max-w-prose">
      <PageHeader title="Page not found" description="There is nothing at this address. The link may be old, or the address mistyped." />
      <ButtonLink to="/" variant="primary">
        Go to the home page
      </ButtonLink>
    </div>
  );
}
