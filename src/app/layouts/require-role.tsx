import type { ReactNode } from "react";
import type { StaffRole } from "@contracts/staff-roles";
import { ButtonLink } from "@/components/ui/button";
import { LockIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { useMe } from "../use-me";

/**
 * Shows a page only to the roles it is for; anyone else gets a plain explanation (the server
 * refuses the data anyway). Roles can change while a page is open, so this is checked on render.
 */
export function RequireRole({ roles, forWhom, children }: { roles: readonly StaffRole[]; forWhom: string; children: ReactNode }) {
  const me = useMe();
  if (roles.includes(me.role)) return <>{children}</>;
  return (
    <div className="max-w-prose">
      <PageHeader title="This page is not part of your role" />
      <p className="flex items-start gap-2 text-lg">
        <LockIcon className="mt-1 size-5 text-ink-muted" />
        <span>This page is for {forWhom}. If you think you should see it, ask your school admin.</span>
      </p>
      <ButtonLink to={me.role === "admin" ? "/staff" : "/"} variant="primary" className="mt-6">
        Go to your start page
      </ButtonLink>
    </div>
  );
}
