import { lazy, Suspense } from "react";
import { Loading } from "@/components/ui/feedback";
import { useSession } from "@/features/auth/api/session";

// Each role's home is its own chunk: a courier's phone never fetches the transfers table.
const CourierLegsRoute = lazy(() =>
  import("@/features/courier/routes/courier-legs").then((m) => ({ default: m.CourierLegsRoute })),
);
const TransfersListRoute = lazy(() =>
  import("@/features/transfers/routes/transfers-list").then((m) => ({ default: m.TransfersListRoute })),
);

/** Home is the work: couriers see the legs they carry, everyone else the transfers list. */
export function HomeRoute() {
  const { data } = useSession();
  if (!data) return null;
  return (
    <Suspense fallback={<Loading />}>
      {data.abilities.carryTransfers ? <CourierLegsRoute /> : <TransfersListRoute />}
    </Suspense>
  );
}
