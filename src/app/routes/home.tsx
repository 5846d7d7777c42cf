import { useSession } from "@/features/auth/api/session";
import { CourierLegsRoute } from "@/features/courier/routes/courier-legs";
import { TransfersListRoute } from "@/features/transfers/routes/transfers-list";

/** Home is the work: couriers see the legs they carry, everyone else the transfers list. */
export function HomeRoute() {
  const { data } = useSession();
  if (!data) return null;
  return data.abilities.carryTransfers ? <CourierLegsRoute /> : <TransfersListRoute />;
}
