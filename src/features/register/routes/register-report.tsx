import { useState } from "react";
import { useSearchParams } from "react-router";
import { formatDate } from "@shared/dates";
import { REGISTER_EVENT_KIND_WORDS, REPORT_COLUMN_WORDS } from "@shared/words";
import { REPORT_COLUMNS } from "@shared/constants";
import { Button } from "@/components/ui/button";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { SelectField, TextField } from "@/components/ui/field";
import { Card, PageHeader } from "@/components/ui/page";
import { Table, Td, Th } from "@/components/ui/table";
import {
  reportDownloadHref,
  usePermitPlans,
  useRegisterReport,
  useSaveReportingPlan,
  type PermitPlan,
} from "../api/register-report";

const MONTHS = [
  "January",
  "February",
  "March",
  "April",
  "May",
  "June",
  "July",
  "August",
  "September",
  "October",
  "November",
  "December",
];
const monthOptions = [{ value: "", label: "Not set" }, ...MONTHS.map((m, i) => ({ value: String(i + 1), label: m }))];

function ReportingPlanForm({ permit }: { permit: PermitPlan }) {
  const save = useSaveReportingPlan();
  const [start, setStart] = useState(String(permit.reportStartMonth ?? ""));
  const [dueMonth, setDueMonth] = useState(String(permit.reportDueMonth ?? ""));
  const [dueDay, setDueDay] = useState(String(permit.reportDueDay ?? ""));
  const n = (value: string) => (value ? Number(value) : null);
  return (
    <form
      className="grid gap-3 sm:grid-cols-4"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate({
          permitId: permit.id,
          reportStartMonth: n(start),
          reportDueMonth: n(dueMonth),
          reportDueDay: n(dueDay),
        });
      }}
    >
      <SelectField
        label="Reporting year starts in"
        value={start}
        onChange={(e) => setStart(e.target.value)}
        options={monthOptions}
        hint="January for a calendar year"
      />
      <SelectField
        label="Report due in"
        value={dueMonth}
        onChange={(e) => setDueMonth(e.target.value)}
        options={monthOptions}
      />
      <TextField label="Due day" inputMode="numeric" value={dueDay} onChange={(e) => setDueDay(e.target.value)} />
      <div className="flex items-end">
        <Button type="submit" variant="secondary" busy={save.isPending}>
          Save the reporting year
        </Button>
      </div>
      {save.error ? (
        <Notice tone="block" role="alert">
          {save.error.message}
        </Notice>
      ) : null}
      <p className="text-sm text-ink-soft sm:col-span-4">
        {permit.nextReport
          ? `Next report: ${formatDate(permit.nextReport.from)} to ${formatDate(permit.nextReport.to)}, due ${formatDate(permit.nextReport.dueOn)}. Members get an e-mail 30 and 7 days before.`
          : "No reporting year set: no reminders are sent. Your permit's conditions say when a report is due."}
      </p>
    </form>
  );
}

/** The yearly report for a permit: a preview, the downloads, and the permit's reporting year. */
export function RegisterReportRoute() {
  const [search, setSearch] = useSearchParams();
  const permits = usePermitPlans();
  const permitId = search.get("permitId") ?? "";
  const from = search.get("from") ?? "";
  const to = search.get("to") ?? "";
  const query = permitId ? { permitId, ...(from ? { from } : {}), ...(to ? { to } : {}) } : null;
  const report = useRegisterReport(query);
  const set = (key: string, value: string) =>
    setSearch((current) => {
      const next = new URLSearchParams(current);
      if (value) next.set(key, value);
      else next.delete(key);
      return next;
    });
  const permit = permits.data?.find((p) => p.id === permitId);
  return (
    <>
      <PageHeader title="Yearly report" eyebrow="Register">
        Counts per species for a permit and a period, and every event behind them. Check it against your records; the
        issuing agency's rules decide what the report must hold.
      </PageHeader>
      <div className="mb-4 grid gap-3 sm:grid-cols-3">
        <SelectField
          label="Permit"
          value={permitId}
          onChange={(e) => set("permitId", e.target.value)}
          options={[
            { value: "", label: "Choose a permit" },
            ...(permits.data ?? []).map((p) => ({ value: p.id, label: `${p.number} (${p.jurisdiction})` })),
          ]}
        />
        <TextField
          label="From"
          type="date"
          value={from}
          onChange={(e) => set("from", e.target.value)}
          hint="Left empty: the last reporting year"
        />
        <TextField label="To" type="date" value={to} onChange={(e) => set("to", e.target.value)} />
      </div>
      {permit ? (
        <Card title="Reporting year and due date" className="mb-4">
          <ReportingPlanForm key={permit.id} permit={permit} />
        </Card>
      ) : null}
      {!query ? (
        <EmptyState title="Choose a permit">
          The report covers the animals linked to the permit or of the species it lists.
        </EmptyState>
      ) : report.isPending ? (
        <Loading label="Adding up the register…" />
      ) : report.error ? (
        <Notice tone="block" role="alert">
          {report.error.message}
        </Notice>
      ) : report.data.species.length === 0 ? (
        <EmptyState title="Nothing to report for this period">
          No animal this permit covers was held, came in or left between {formatDate(report.data.from)} and{" "}
          {formatDate(report.data.to)}. The report covers the animals linked to the permit and those of the species it
          lists.
        </EmptyState>
      ) : (
        <>
          <div className="mb-3 flex flex-wrap gap-3">
            <span>
              {formatDate(report.data.from)} to {formatDate(report.data.to)}
              {report.data.dueOn ? `, due ${formatDate(report.data.dueOn)}` : ""}
            </span>
            <a
              className="text-fern underline"
              href={reportDownloadHref({ permitId, from: report.data.from, to: report.data.to }, "pdf")}
              download
            >
              Download PDF
            </a>
            <a
              className="text-fern underline"
              href={reportDownloadHref({ permitId, from: report.data.from, to: report.data.to }, "csv")}
              download
            >
              Download CSV
            </a>
          </div>
          <Table
            caption="Animals per species"
            head={
              <tr>
                <Th>Species</Th>
                <Th className="text-right">At the start</Th>
                {REPORT_COLUMNS.map((c) => (
                  <Th key={c} className="text-right">
                    {REPORT_COLUMN_WORDS[c]}
                  </Th>
                ))}
                <Th className="text-right">At the end</Th>
              </tr>
            }
          >
            {report.data.species.map((s) => (
              <tr key={s.scientificName}>
                <Td>
                  <i>{s.scientificName}</i>
                </Td>
                <Td className="text-right tabular-nums">{s.start}</Td>
                {REPORT_COLUMNS.map((c) => (
                  <Td key={c} className="text-right tabular-nums">
                    {s[c]}
                  </Td>
                ))}
                <Td className="text-right font-semibold tabular-nums">{s.end}</Td>
              </tr>
            ))}
          </Table>
          {report.data.species.map((s) =>
            s.events.length ? (
              <section key={s.scientificName} className="mt-4">
                <h2 className="mb-2 font-semibold">
                  <i>{s.scientificName}</i>
                </h2>
                <ul className="text-sm">
                  {s.events.map((e, i) => (
                    <li key={i}>
                      {formatDate(e.on)} · {REGISTER_EVENT_KIND_WORDS[e.kind]} ({e.count})
                      {e.identifier ? ` · ${e.identifier}` : ""}
                      {e.counterparty
                        ? ` · ${[e.counterparty.name, e.counterparty.address, e.counterparty.permitNumber && `permit ${e.counterparty.permitNumber}`].filter(Boolean).join(", ")}`
                        : ""}
                    </li>
                  ))}
                </ul>
              </section>
            ) : null,
          )}
        </>
      )}
    </>
  );
}
