import { useEffect, useId, useRef, useState } from "react";
import type { Me } from "@contracts/staff";
import { ChevronDownIcon, DevicesIcon, SignOutIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import { STAFF_ROLE_LABELS } from "@contracts/staff-roles";
import { useSignOut } from "../api/sign-out";
import { useSignOutEverywhere } from "../api/sign-out-everywhere";

export const initialsOf = (name: string) =>
  name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((part) => part[0]!.toLocaleUpperCase())
    .join("");

const ITEM =
  "flex w-full min-h-touch items-center gap-3 rounded-control px-3 py-2 text-left font-bold text-ink hover:bg-accent-soft cursor-pointer aria-disabled:opacity-60";

/**
 * The signed-in person (name and role) and the ways to sign out. A disclosure: the button
 * opens a small panel, focus moves into it, Escape or a click outside closes it.
 */
export function AccountMenu({ me }: { me: Me }) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const buttonRef = useRef<HTMLButtonElement>(null);
  const rootRef = useRef<HTMLDivElement>(null);
  const signOut = useSignOut();
  const signOutEverywhere = useSignOutEverywhere();
  const busy = signOut.isPending || signOutEverywhere.isPending;
  const failure = signOut.error ?? signOutEverywhere.error;

  useEffect(() => {
    if (!open) return;
    rootRef.current?.querySelector<HTMLElement>("[data-menu-item]")?.focus();
    const onPointerDown = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setOpen(false);
    };
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.key === "Escape") {
        setOpen(false);
        buttonRef.current?.focus();
      }
    };
    document.addEventListener("pointerdown", onPointerDown);
    document.addEventListener("keydown", onKeyDown);
    return () => {
      document.removeEventListener("pointerdown", onPointerDown);
      document.removeEventListener("keydown", onKeyDown);
    };
  }, [open]);

  return (
    <div
      ref={rootRef}
      className="relative"
      onBlur={(event) => {
        // Tabbing out of the panel closes it.
        if (open && !event.currentTarget.contains(event.relatedTarget as Node | null)) setOpen(false);
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((o) => !o)}
        className="flex min-h-touch cursor-pointer items-center gap-2.5 rounded-control border-2 border-transparent px-1.5 py-1 text-left hover:border-line sm:px-2"
      >
        <span
          aria-hidden="true"
          className="flex size-9 items-center justify-center rounded-full bg-ink font-mono text-sm font-bold text-paper"
        >
          {initialsOf(me.displayName)}
        </span>
        <span className="hidden min-w-0 leading-tight sm:block">
          <span className="block max-w-48 truncate font-bold">{me.displayName}</span>
          <span className="block text-sm text-ink-muted">{STAFF_ROLE_LABELS[me.role]}</span>
        </span>
        <span className="sr-only sm:hidden">
          {me.displayName}, {STAFF_ROLE_LABELS[me.role]}
        </span>
        <span className="sr-only">: account menu</span>
        <ChevronDownIcon className={cx("size-5 transition-transform", open && "rotate-180")} />
      </button>

      <div
        id={panelId}
        hidden={!open}
        className="absolute right-0 z-40 mt-2 w-[min(20rem,calc(100vw-1.5rem))] rounded-card border border-line bg-surface p-2 shadow-lifted"
      >
        <div className="border-b border-line px-3 pb-3 pt-2">
          <p className="font-bold">{me.displayName}</p>
          <p className="text-sm text-ink-muted">
            {STAFF_ROLE_LABELS[me.role]}
            {me.department ? ` · ${me.department.name}` : ""}
          </p>
          <p className="break-all text-sm text-ink-muted">{me.email}</p>
          <p className="text-sm text-ink-muted">{me.school.name}</p>
        </div>
        <ul className="mt-2 grid gap-1">
          <li>
            <button
              type="button"
              data-menu-item
              className={ITEM}
              aria-disabled={busy || undefined}
              onClick={() => !busy && signOut.mutate()}
            >
              {signOut.isPending ? <Spinner className="size-5" /> : <SignOutIcon />}
              Sign out
            </button>
          </li>
          <li>
            <button
              type="button"
              data-menu-item
              className={ITEM}
              aria-disabled={busy || undefined}
              aria-describedby={`${panelId}-everywhere`}
              onClick={() => !busy && signOutEverywhere.mutate()}
            >
              {signOutEverywhere.isPending ? <Spinner className="size-5" /> : <DevicesIcon />}
              Sign out on all devices
            </button>
            <p id={`${panelId}-everywhere`} className="px-3 pb-1 text-sm text-ink-muted">
              Also ends your sessions on other computers, phones and tablets.
            </p>
          </li>
        </ul>
        {failure ? (
          <Notice tone="danger" live="alert" className="m-1 mt-2">
            <p>{errorMessage(failure)}</p>
          </Notice>
        ) : null}
      </div>
    </div>
  );
}
