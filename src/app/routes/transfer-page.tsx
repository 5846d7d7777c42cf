import { TransferDetailRoute } from "@/features/transfers/routes/transfer-detail";
import { ComplianceSection } from "@/features/compliance/components/compliance-section";
import { TemperatureSection } from "@/features/temperature/components/temperature-section";
import { ArrivalRecord } from "@/features/check-in/components/arrival-record";

/** The transfer page: the record, with the compliance and temperature checks and the arrival composed in. */
export function TransferPageRoute() {
  return (
    <TransferDetailRoute
      checks={(t) => (
        <div className="grid grid-cols-1 gap-5">
          <ComplianceSection transferId={t.id} />
          <TemperatureSection transferId={t.id} status={t.status} />
        </div>
      )}
      arrival={(t) => <ArrivalRecord transfer={t} />}
    />
  );
}
