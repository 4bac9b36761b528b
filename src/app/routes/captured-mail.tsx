import { Navigate } from "react-router";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { useSession } from "@/features/auth/api/get-session";
import { CapturedMailList } from "@/features/captured-mail/components/captured-mail-list";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { RequireRole } from "../layouts/require-role";

/** Demo only: the messages the local SMTP server caught. In production the page does not exist. */
export function Component() {
  useDocumentTitle("Captured mail");
  const session = useSession();
  if (!session.data?.demo) return <Navigate to="/not-found" replace />;
  return (
    <RequireRole roles={["admin"]} forWhom="school admins in the demo">
      <PageHeader
        eyebrow="Demo"
        title="Captured mail"
        description="In the demo, Linkleap’s e-mail goes to a mail server on this computer instead of out to anyone. Every message it caught is here."
      />
      <Notice tone="info" className="mb-6">
        <p>This page exists only in the demo. With a real mail server, messages go to people’s inboxes.</p>
      </Notice>
      <CapturedMailList />
    </RequireRole>
  );
}
