import { Link, NavLink } from "react-router";
import type { Me } from "@contracts/staff";
import type { StaffRole } from "@contracts/staff-roles";
import { Wordmark } from "@/components/layout/logo-mark";
import { AccountMenu } from "@/features/auth/components/account-menu";
import { cx } from "@/lib/cx";

interface NavItem {
  to: string;
  label: string;
  roles: readonly StaffRole[];
  end?: boolean;
  /** Only in the demo (the captured mail). */
  demoOnly?: boolean;
}

/** Links by role: teachers and heads teach classes; heads also see the department; admins manage staff and pupil data. */
export const NAV_ITEMS: readonly NavItem[] = [
  { to: "/", label: "Home", roles: ["teacher", "head_of_department"], end: true },
  { to: "/classes", label: "Classes", roles: ["teacher", "head_of_department"] },
  { to: "/plans", label: "Plans", roles: ["teacher", "head_of_department"] },
  { to: "/department", label: "Department", roles: ["head_of_department"] },
  { to: "/staff", label: "Staff", roles: ["admin"] },
  { to: "/pupil-data", label: "Pupil data", roles: ["admin"] },
  { to: "/captured-mail", label: "Captured mail", roles: ["admin"], demoOnly: true },
];

export const navItemsFor = (role: StaffRole, demo = false) =>
  NAV_ITEMS.filter((item) => item.roles.includes(role) && (demo || !item.demoOnly));

export function AppHeader({ me, demo = false }: { me: Me; demo?: boolean }) {
  const items = navItemsFor(me.role, demo);
  return (
    <header className="border-b border-line bg-surface">
      <div className="mx-auto flex max-w-page flex-wrap items-center gap-x-6 gap-y-1 px-4 py-2 sm:px-6">
        <Link to="/" className="order-1 flex min-h-touch items-center rounded-control no-underline">
          <Wordmark />
          <span className="sr-only">, home</span>
        </Link>
        <nav aria-label="Main" className="order-3 -mx-1 w-full overflow-x-auto md:order-2 md:mx-0 md:w-auto">
          <ul className="flex gap-1">
            {items.map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end={item.end}
                  className={({ isActive }) =>
                    cx(
                      "relative flex min-h-touch items-center rounded-control px-3.5 font-bold no-underline",
                      isActive
                        ? "bg-accent-soft text-accent after:absolute after:inset-x-3 after:bottom-1 after:h-[3px] after:rounded-full after:bg-accent"
                        : "text-ink hover:bg-sunken",
                    )
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
        <div className="order-2 ml-auto md:order-3">
          <AccountMenu me={me} />
        </div>
      </div>
    </header>
  );
}
