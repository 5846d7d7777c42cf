import { useState } from "react";
import { NavLink, useNavigate } from "react-router";
import { Button } from "@/components/ui/button";
import { UnitsSwitch } from "@/components/ui/units-switch";
import { paths } from "@/config/paths";
import { OFFLINE_HANDOFF_TEXT, USER_ROLE_WORDS } from "@shared/words";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useSignOut, type Session } from "@/features/auth/api/session";
import { useQueuedHandoffs } from "@/lib/offline-data";

type NavItem = { to: string; label: string; show: (s: NonNullable<Session>) => boolean };

/** Navigation follows the abilities the server sent, never a role check of our own. */
const NAV: NavItem[] = [
  { to: paths.home, label: "Transfers", show: (s) => !s.abilities.carryTransfers },
  { to: paths.home, label: "My legs", show: (s) => s.abilities.carryTransfers },
  { to: paths.runs, label: "Runs", show: (s) => s.abilities.readRuns },
  { to: paths.register, label: "Register", show: (s) => s.abilities.draftTransfers },
  { to: paths.permits, label: "Permits", show: (s) => s.abilities.draftTransfers },
  {
    to: paths.canItTravel,
    label: "Can it travel?",
    show: (s) => s.abilities.draftTransfers || s.abilities.manageOrganizations,
  },
  {
    to: paths.planTrip,
    label: "Plan a trip",
    show: (s) => s.abilities.draftTransfers || s.abilities.manageOrganizations,
  },
  { to: paths.organizationMembers, label: "Team", show: (s) => s.abilities.manageOwnOrganization },
  { to: paths.account, label: "Account", show: () => true },
  { to: paths.admin.users, label: "People", show: (s) => s.abilities.manageUsers },
  { to: paths.admin.organizations, label: "Organisations", show: (s) => s.abilities.manageOrganizations },
  { to: paths.admin.rules, label: "Rules", show: (s) => s.abilities.manageOrganizations },
  { to: paths.admin.temperatureProfiles, label: "Temperature profiles", show: (s) => s.abilities.manageOrganizations },
  { to: paths.admin.mail, label: "Caught mail", show: (s) => s.abilities.readCaughtMail },
];

/**
 * Two rows on a wide screen (name, units and account; then the sections), one row and a Menu
 * button on a phone, where the sections and the account fold out under the bar.
 */
export function AppHeader({ session }: { session: NonNullable<Session> }) {
  const signOut = useSignOut();
  const navigate = useNavigate();
  const [menuOpen, setMenuOpen] = useState(false);
  // Handoffs kept on this phone go at sign-out (D40): ask first while any is not yet sent.
  const kept = useQueuedHandoffs(session.user.id).data ?? [];
  const [askSignOut, setAskSignOut] = useState(false);
  const doSignOut = () => signOut.mutate(undefined, { onSettled: () => navigate(paths.signIn) });
  const folded = menuOpen ? "flex" : "hidden";

  return (
    <header className="border-b border-rule bg-paper-card/90">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-2 gap-y-2 px-4 py-2 sm:gap-x-4">
        <NavLink to={paths.home} className="mr-auto font-display text-xl font-bold text-fern sm:text-2xl">
          Hatchway
        </NavLink>
        <UnitsSwitch />
        <button
          type="button"
          className="inline-flex min-h-11 items-center rounded-md border border-rule bg-paper-card px-3 font-medium sm:hidden"
          aria-expanded={menuOpen}
          aria-controls="main-menu account-menu"
          onClick={() => setMenuOpen((open) => !open)}
        >
          Menu
        </button>
        <div
          id="account-menu"
          className={`${folded} order-last w-full items-center justify-between gap-3 border-t border-rule pt-2 sm:order-none sm:flex sm:w-auto sm:border-0 sm:pt-0`}
        >
          <div className="text-sm leading-tight sm:text-right">
            <p className="font-semibold" data-testid="signed-in-as">
              {session.user.displayName}
            </p>
            <p className="text-ink-soft">{session.user.organization?.name ?? USER_ROLE_WORDS[session.user.role]}</p>
          </div>
          <Button
            variant="secondary"
            onClick={() => (kept.length ? setAskSignOut(true) : doSignOut())}
            busy={signOut.isPending}
          >
            Sign out
          </Button>
          <ConfirmDialog
            open={askSignOut}
            title={OFFLINE_HANDOFF_TEXT.signOutQuestion}
            confirmLabel="Sign out anyway"
            cancelLabel="Stay signed in"
            tone="danger"
            busy={signOut.isPending}
            onConfirm={doSignOut}
            onCancel={() => setAskSignOut(false)}
          >
            {kept.length === 1 ? "One handoff is" : `${kept.length} handoffs are`} kept on this phone.{" "}
            {OFFLINE_HANDOFF_TEXT.signOutDetail}
          </ConfirmDialog>
        </div>
        <nav id="main-menu" aria-label="Main" className={`${folded} w-full sm:order-last sm:flex`}>
          <ul className="flex w-full flex-col gap-1 sm:flex-row sm:flex-wrap">
            {NAV.filter((item) => item.show(session)).map((item) => (
              <li key={item.label}>
                <NavLink
                  to={item.to}
                  end={item.to === paths.home}
                  onClick={() => setMenuOpen(false)}
                  className={({ isActive }) =>
                    `flex min-h-11 items-center whitespace-nowrap rounded-md px-3 font-medium ${isActive ? "bg-fern-light text-fern-dark" : "text-ink-soft hover:bg-paper-deep hover:text-ink"}`
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
      </div>
    </header>
  );
}
