import { USER_ROLE_WORDS } from "@shared/words";
import { NavLink, Navigate, Outlet, useLocation, useNavigate } from "react-router";
import { Button } from "@/components/ui/button";
import { Loading, Notice } from "@/components/ui/feedback";
import { UnitsSwitch } from "@/components/ui/units-switch";
import { paths } from "@/config/paths";
import type { Viewer } from "@/lib/viewer";
import { useSession, useSignOut, type Session } from "@/features/auth/api/session";

type NavItem = { to: string; label: string; show: (s: NonNullable<Session>) => boolean };

/** Navigation follows the abilities the server sent, never a role check of our own. */
const NAV: NavItem[] = [
  { to: paths.home, label: "Transfers", show: (s) => !s.abilities.carryTransfers },
  { to: paths.home, label: "My legs", show: (s) => s.abilities.carryTransfers },
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
  { to: paths.admin.users, label: "People", show: (s) => s.abilities.manageUsers },
  { to: paths.admin.organizations, label: "Organisations", show: (s) => s.abilities.manageOrganizations },
  { to: paths.admin.rules, label: "Rules", show: (s) => s.abilities.manageOrganizations },
  { to: paths.admin.temperatureProfiles, label: "Temperature profiles", show: (s) => s.abilities.manageOrganizations },
  { to: paths.admin.mail, label: "Caught mail", show: (s) => s.abilities.readCaughtMail },
];

export function AppLayout() {
  const session = useSession();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const location = useLocation();

  if (session.isPending)
    return (
      <div className="mx-auto max-w-6xl px-4">
        <Loading />
      </div>
    );
  if (session.error) {
    return (
      <div className="mx-auto max-w-xl px-4 py-16">
        <Notice tone="block" role="alert" title="Hatchway is not answering">
          {(session.error as Error).message}
        </Notice>
      </div>
    );
  }
  if (!session.data)
    return <Navigate to={`${paths.signIn}?next=${encodeURIComponent(location.pathname + location.search)}`} replace />;
  const s = session.data;

  return (
    <div className="min-h-screen">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-paper-card focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <header className="border-b border-rule bg-paper-card/90">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-4 py-3">
          <NavLink to={paths.home} className="font-display text-2xl font-bold text-fern">
            Hatchway
          </NavLink>
          <nav aria-label="Main" className="order-3 w-full sm:order-none sm:w-auto">
            <ul className="flex flex-wrap gap-1">
              {NAV.filter((item) => item.show(s)).map((item) => (
                <li key={item.label}>
                  <NavLink
                    to={item.to}
                    end={item.to === paths.home}
                    className={({ isActive }) =>
                      `inline-flex min-h-11 items-center rounded-md px-3 font-medium ${isActive ? "bg-fern-light text-fern-dark" : "text-ink-soft hover:bg-paper-deep hover:text-ink"}`
                    }
                  >
                    {item.label}
                  </NavLink>
                </li>
              ))}
            </ul>
          </nav>
          <div className="flex items-center gap-3">
            <UnitsSwitch />
            <div className="text-right text-sm leading-tight">
              <p className="font-semibold" data-testid="signed-in-as">
                {s.user.displayName}
              </p>
              <p className="text-ink-soft">{s.user.organization?.name ?? USER_ROLE_WORDS[s.user.role]}</p>
            </div>
            <Button
              variant="secondary"
              onClick={() => signOut.mutate(undefined, { onSettled: () => navigate(paths.signIn) })}
              busy={signOut.isPending}
            >
              Sign out
            </Button>
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-6xl px-4 py-6">
        <Outlet context={s satisfies Viewer} />
      </main>
    </div>
  );
}
