import { useId } from "react";
import { Loading, Notice } from "@/components/ui/feedback";
import { useTransferCompliance } from "../api/transfer-compliance";
import { CoverageList } from "./coverage-list";
import { FindingsByAnimal, ShipmentFindings } from "./findings-list";
import { LegalCaution } from "./legal-caution";
import { OverrideForm } from "./override-form";
import { TransferDocuments } from "./transfer-documents";
import { VerdictBanner } from "./verdict-banner";
import { formatDate, formatInstant } from "@shared/dates";

/**
 * The transfer page's compliance section: the verdict, each animal's findings with their
 * sources, the documents the transfer uses, the admin's override, and the legal caution.
 * It fetches its own data; place it on the transfer page with the transfer's id.
 */
export function ComplianceSection({ transferId }: { transferId: string }) {
  const headingId = useId();
  const compliance = useTransferCompliance(transferId);
  return (
    <section
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-card border border-rule bg-paper-card p-4 shadow-card sm:p-5"
    >
      <h2 id={headingId} className="text-lg font-semibold">
        Rules and permits
      </h2>
      {compliance.isPending ? (
        <Loading label="Checking the rules…" />
      ) : compliance.error ? (
        <Notice tone="block" role="alert">
          {(compliance.error as Error).message}
        </Notice>
      ) : (
        <>
          <VerdictBanner
            verdict={compliance.data.verdict}
            coverage={compliance.data.coverage}
            overridden={compliance.data.override !== null}
          />
          {compliance.data.override ? (
            <Notice tone="info" title="Overridden by an administrator">
              {compliance.data.override.admin.displayName}, {formatInstant(compliance.data.override.at)}: “
              {compliance.data.override.reason}”
            </Notice>
          ) : null}
          <p className="text-sm text-ink-soft">
            Checked for the ship date {formatDate(compliance.data.shipDate)}, with the permits and certificates the
            sender and the receiver have on file: {compliance.data.rulesUsed.length} rule
            {compliance.data.rulesUsed.length === 1 ? " applies" : "s apply"}.
          </p>
          <CoverageList coverage={compliance.data.coverage} />
          <ShipmentFindings findings={compliance.data.shipmentFindings} />
          <FindingsByAnimal animals={compliance.data.animals} />
          {compliance.data.abilities.readDocuments ? (
            <div className="flex flex-col gap-2">
              <h3 className="font-semibold">Documents for this transfer</h3>
              <TransferDocuments transferId={transferId} canAttach={compliance.data.abilities.attachDocuments} />
            </div>
          ) : null}
          {compliance.data.abilities.override ? <OverrideForm transferId={transferId} /> : null}
          <LegalCaution />
        </>
      )}
    </section>
  );
}
