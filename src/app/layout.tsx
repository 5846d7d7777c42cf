import { Navigate, Outlet, useLocation } from "react-router";
import { Loading, Notice } from "@/components/ui/feedback";
import { ToastProvider } from "@/components/ui/toast";
import { paths } from "@/config/paths";
import type { Viewer } from "@/lib/viewer";
import { useSession } from "@/features/auth/api/session";
import { OfflineHandoffSender } from "@/features/courier/components/offline-handoff-sender";
import { forgetOtherPeople } from "@/lib/offline-data";
import { useEffect } from "react";
import { AppHeader } from "./app-header";

export function AppLayout() {
  const session = useSession();
  const location = useLocation();
  const userId = session.data?.user.id;
  // Another person on this phone since the last visit: what was kept for them goes (D40).
  useEffect(() => {
    if (userId) void forgetOtherPeople(userId);
  }, [userId]);

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

  return (
    <ToastProvider>
      <OfflineHandoffSender userId={session.data.user.id} />
      <div className="min-h-screen">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-paper-card focus:px-3 focus:py-2"
        >
          Skip to content
        </a>
        <AppHeader session={session.data} />
        <main id="main" className="mx-auto max-w-6xl px-4 py-6">
          <Outlet context={session.data satisfies Viewer} />
        </main>
      </div>
    </ToastProvider>
  );
}
