import { CHECK_MARK_WORDS, TEMPERATURE_VERDICT_WORDS } from "@shared/words";
import { useId } from "react";
import type { TransferStatus } from "@shared/constants";
import { blocksShipping, type TransferTemperatureDto } from "@shared/temperature/report";
import { Loading, Notice } from "@/components/ui/feedback";
import { formatInstant } from "@shared/dates";
import { useTransferTemperature } from "../api/transfer-temperature";
import { Link } from "react-router";
import { paths } from "@/config/paths";
import { AssessmentDetails } from "./assessment-details";
import { ReadingsTable } from "./readings-table";
import { TemperatureCautions } from "./temperature-cautions";
import { TemperatureChart } from "./temperature-chart";
import { TripMap } from "./trip-map";
import { TripPlanCard } from "./trip-plan-card";

/**
 * The transfer page's temperature section: the chart of the trip, the advice and packing, a
 * safer day, each box's verdict, the re-checks before departure and the cautions. It fetches
 * its own data; place it on the transfer page with the transfer's id.
 */
export function TemperatureSection({ transferId, status }: { transferId: string; status: TransferStatus }) {
  const headingId = useId();
  const temperature = useTransferTemperature(transferId);
  return (
    <section
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-card border border-rule bg-paper-card p-4 shadow-card sm:p-5"
    >
      <h2 id={headingId} className="text-lg font-semibold">
        Temperature on the way
      </h2>
      {temperature.isPending ? (
        <Loading label="Reading the forecast…" />
      ) : temperature.error ? (
        <Notice tone="block" role="alert" title="The temperature check did not load">
          {(temperature.error as Error).message} Until it does, treat the trip as not checked.
        </Notice>
      ) : (
        <TemperatureBody report={temperature.data} status={status} transferId={transferId} />
      )}
    </section>
  );
}

/** What a blocking verdict means where the transfer stands: before confirmation it holds the step; once cleared it is a call to act. */
function BlockNotice({ report, status }: { report: TransferTemperatureDto; status: TransferStatus }) {
  if (!blocksShipping(report.verdict)) return null;
  const verdict = TEMPERATURE_VERDICT_WORDS[report.verdict].toLowerCase();
  if (status === "draft" || status === "awaiting_receiver") {
    return (
      <Notice tone="block" title="This blocks “cleared to travel”">
        While the verdict is “{verdict}”, the receiver can only confirm the transfer by overriding the temperature check
        with a reason. The reason, the verdict and who gave it are written into the custody log.
      </Notice>
    );
  }
  if (status === "ready") {
    return (
      <Notice tone="block" title={`Cleared to travel, but the check says “${verdict}”`}>
        The transfer was cleared before this verdict or past it with a reason in the custody log. While the verdict is “
        {verdict}”, move the departure, change the packing or the route, or keep the animals home; an edit sends the
        transfer back to the receiver to confirm.
      </Notice>
    );
  }
  return null;
}

function TemperatureBody({
  report,
  status,
  transferId,
}: {
  report: TransferTemperatureDto;
  status: TransferStatus;
  transferId: string;
}) {
  const departureAt = report.exposures?.[0]?.from ?? report.hours[0]?.at ?? new Date().toISOString();
  return (
    <>
      {report.alert ? (
        <Notice tone="caution" role="alert" title={`The advice changed (${formatInstant(report.alert.at)})`}>
          Before: {report.alert.previous.message} Now: {report.alert.current.message} Both parties were e-mailed.
        </Notice>
      ) : null}
      <AssessmentDetails report={report} showBoxes />
      <BlockNotice report={report} status={status} />
      {report.plan ? <TripPlanCard transferId={transferId} plan={report.plan} departureAt={departureAt} /> : null}
      <TemperatureChart report={report} readings={report.readings ?? []} />
      <TripMap report={report} />
      <ReadingsTable readings={report.readings ?? []} />
      {report.checks.length > 0 ? (
        <div className="text-sm">
          <h3 className="font-semibold">Checks kept on the record</h3>
          <ul className="list-disc pl-5 text-ink-soft">
            {report.checks.map((c) => (
              <li key={c.id}>
                {formatInstant(c.checkedAt)}, {CHECK_MARK_WORDS[c.mark]}:{" "}
                {TEMPERATURE_VERDICT_WORDS[c.verdict].toLowerCase()}
              </li>
            ))}
          </ul>
          <p className="text-ink-faint">
            Hatchway checks again 24 hours and 4 hours before departure and e-mails both parties when the advice
            changes.
          </p>
        </div>
      ) : null}
      <p className="text-sm">
        <Link to={paths.modelAccuracy} className="text-fern underline">
          How close the model has been to the readings across your transfers
        </Link>
      </p>
      <TemperatureCautions />
    </>
  );
}
