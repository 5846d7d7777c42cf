import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { VehicleConditioning, ParkedKind } from "@shared/constants";
import type { TransferTemperatureDto } from "@shared/temperature/report";
import { api } from "@/lib/api-client";
import { transferKeys } from "@/lib/transfer-queries";

type Range = { min: number | null; max: number | null } | null;
export type TripPlanBody = {
  vehicle: VehicleConditioning | null;
  vehicleRangeF: Range;
  stops: { at: string; durationMin: number; parked: ParkedKind }[];
};
export type LegVehicleBody = { vehicle: VehicleConditioning | null; vehicleRangeF: Range };

/** The sender says how the box travels; the transfer (its version) and its verdict are read again. */
export function useUpdateTripPlan(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: TripPlanBody) =>
      api<TransferTemperatureDto>(`/api/transfers/${encodeURIComponent(transferId)}/temperature/plan`, {
        method: "PUT",
        body,
      }),
    onSuccess: () => void client.invalidateQueries({ queryKey: transferKeys.detail(transferId) }),
  });
}

/** A courier (or the sender) declares a leg's vehicle. */
export function useDeclareLegVehicle(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ legId, body }: { legId: string; body: LegVehicleBody }) =>
      api<TransferTemperatureDto>(
        `/api/transfers/${encodeURIComponent(transferId)}/legs/${encodeURIComponent(legId)}/vehicle`,
        { method: "PUT", body },
      ),
    onSuccess: () => void client.invalidateQueries({ queryKey: transferKeys.detail(transferId) }),
  });
}
