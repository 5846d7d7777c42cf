import { useEffect, useState, type ChangeEvent } from "react";
import { LIMITS } from "@shared/constants";
import { sniffScanType } from "@shared/compliance/scan-type";
import type { DocumentDto, ScanDto } from "@shared/schemas/compliance";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { fetchScan, useUploadScan } from "../api/documents";

const MEGABYTE = 1024 * 1024;
const sizeText = (bytes: number) =>
  bytes >= MEGABYTE ? `${(bytes / MEGABYTE).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;

/** One scan: an image previews inline, a PDF becomes a download link; both from an object URL we revoke. */
function ScanItem({ scan }: { scan: ScanDto }) {
  const [url, setUrl] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  useEffect(
    () => () => {
      if (url) URL.revokeObjectURL(url);
    },
    [url],
  );

  const open = async () => {
    setBusy(true);
    setError(null);
    try {
      setUrl(URL.createObjectURL(await fetchScan(scan)));
    } catch (err) {
      setError(err instanceof ApiError ? err.message : "The scan could not be loaded.");
    } finally {
      setBusy(false);
    }
  };

  const isImage = scan.contentType !== "application/pdf";
  return (
    <li className="flex flex-col gap-2 border-t border-rule py-2 first:border-t-0">
      <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <span>
          {scan.originalName}{" "}
          <span className="text-ink-soft">
            ({scan.contentType === "application/pdf" ? "PDF" : scan.contentType === "image/png" ? "PNG" : "JPEG"},{" "}
            {sizeText(scan.sizeBytes)})
          </span>
        </span>
        {url ? (
          isImage ? null : (
            <a
              href={url}
              download={scan.originalName}
              className="inline-flex min-h-11 items-center font-medium text-fern underline underline-offset-2"
            >
              Download the PDF
            </a>
          )
        ) : (
          <Button variant="secondary" onClick={open} busy={busy}>
            {isImage ? "Preview" : "Get the PDF"}
          </Button>
        )}
      </div>
      {error ? (
        <Notice tone="block" role="alert">
          {error}
        </Notice>
      ) : null}
      {url && isImage ? (
        <img
          src={url}
          alt={`Scan ${scan.originalName}`}
          className="max-h-96 w-auto self-start rounded border border-rule"
        />
      ) : null}
      <p className="wrap-anywhere text-xs text-ink-soft">SHA-256 {scan.sha256}</p>
    </li>
  );
}

/** Checks a chosen file as the server will (size, then the first bytes) so a wrong file is named at once. */
async function fileProblem(file: File): Promise<string | null> {
  if (file.size > LIMITS.uploadBytesMax)
    return `That file is ${sizeText(file.size)}; the limit is ${LIMITS.uploadBytesMax / MEGABYTE} MB.`;
  const head = new Uint8Array(await file.slice(0, 16).arrayBuffer());
  return sniffScanType(head)
    ? null
    : "That file is not a PDF, JPEG or PNG. Scan or save the document in one of those formats.";
}

/** A document's scans, with an upload for the holder. */
export function ScanList({ document }: { document: DocumentDto }) {
  const upload = useUploadScan();
  const [problem, setProblem] = useState<string | null>(null);
  const scans = document.scans ?? [];

  const choose = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = "";
    if (!file) return;
    const found = await fileProblem(file);
    setProblem(found);
    if (!found) upload.mutate({ documentId: document.id, file });
  };

  return (
    <div className="flex flex-col gap-2">
      {scans.length === 0 ? (
        <p className="text-sm text-ink-soft">No scans yet.</p>
      ) : (
        <ul>
          {scans.map((scan) => (
            <ScanItem key={scan.id} scan={scan} />
          ))}
        </ul>
      )}
      {document.abilities.upload ? (
        <div className="flex flex-col gap-2">
          <label className="text-sm font-semibold" htmlFor={`scan-${document.id}`}>
            Add a scan (PDF, JPEG or PNG, up to 10 MB)
          </label>
          <input
            id={`scan-${document.id}`}
            type="file"
            accept="application/pdf,image/jpeg,image/png"
            onChange={choose}
            disabled={upload.isPending}
            className="text-sm"
          />
          {upload.isPending ? (
            <p role="status" className="text-sm text-ink-soft">
              Uploading…
            </p>
          ) : null}
          {problem ? (
            <Notice tone="block" role="alert">
              {problem}
            </Notice>
          ) : null}
          {upload.error ? (
            <Notice tone="block" role="alert">
              {upload.error instanceof ApiError ? upload.error.message : "The scan was not saved."}
            </Notice>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
