import { useState } from "react";
import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { Table, Td, Th } from "@/components/ui/table";
import { paths } from "@/config/paths";
import { useImportRegister } from "../api/register-report";

const EXAMPLE =
  "scientificName,count,sex,identifier,origin,hatchDate,acquiredOn,source.name,source.permitNumber\nPython regius,1,female,985112000001234,captive_bred,2023-06-01,2023-09-15,Demo Exotics,DEMO-FL-3";

/** A spreadsheet of animals already in care: every row is checked, and nothing is imported until all are right. */
export function RegisterImportRoute() {
  const upload = useImportRegister();
  const [file, setFile] = useState<File | null>(null);
  const result = upload.data;
  return (
    <>
      <PageHeader title="Import a spreadsheet" eyebrow="Register">
        Save your spreadsheet as CSV (UTF-8) with a heading row. Columns:{" "}
        {EXAMPLE.split("\n")[0]!.split(",").join(", ")}. Sex and origin may be written as words.
      </PageHeader>
      <pre className="mb-4 overflow-x-auto rounded-md bg-paper-deep p-3 text-sm">{EXAMPLE}</pre>
      <form
        className="flex flex-wrap items-end gap-3"
        onSubmit={async (e) => {
          e.preventDefault();
          if (file) upload.mutate(await file.text());
        }}
      >
        <label className="flex flex-col gap-1 text-sm font-semibold">
          CSV file
          <input
            type="file"
            accept=".csv,text/csv"
            className="min-h-11"
            onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          />
        </label>
        <Button type="submit" busy={upload.isPending} disabled={!file}>
          Check and import
        </Button>
      </form>
      <div className="mt-4">
        {upload.error ? (
          <Notice tone="block" role="alert">
            {upload.error.message}
          </Notice>
        ) : result && "imported" in result ? (
          <Notice tone="ok" role="status" title={`${result.imported} entries imported`}>
            <Link to={paths.register} className="text-fern underline">
              See them in the register
            </Link>
          </Notice>
        ) : result ? (
          <>
            <Notice tone="block" role="alert" title="Nothing was imported">
              {result.rows.length} row{result.rows.length === 1 ? "" : "s"} need correcting. Row numbers are the
              spreadsheet's: the headings are row 1.
            </Notice>
            <div className="mt-3">
              <Table
                caption="Rows to correct"
                head={
                  <tr>
                    <Th>Row</Th>
                    <Th>What to correct</Th>
                  </tr>
                }
              >
                {result.rows.map((row) => (
                  <tr key={`${row.row}-${row.message}`}>
                    <Td>{row.row}</Td>
                    <Td>{row.message}</Td>
                  </tr>
                ))}
              </Table>
            </div>
          </>
        ) : null}
      </div>
    </>
  );
}
