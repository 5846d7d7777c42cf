/**
 * The paper that travels with the animals: the packing manifest and the box labels, to
 * open in the browser (and print) or to download. The server decides who may read them.
 */
export function PaperworkLinks({ transferId, labels = true }: { transferId: string; labels?: boolean }) {
  const base = `/api/transfers/${encodeURIComponent(transferId)}`;
  const link =
    "inline-flex min-h-11 items-center gap-2 rounded-md border border-rule bg-paper-card px-4 font-medium text-fern hover:bg-paper-deep";
  return (
    <nav aria-label="Manifest and labels" className="flex flex-wrap gap-2">
      <a className={link} href={`${base}/manifest.pdf`} target="_blank" rel="noopener">
        Open the manifest (PDF)
      </a>
      <a className={link} href={`${base}/manifest.pdf?download=1`} download>
        Download the manifest
      </a>
      {labels ? (
        <>
          <a className={link} href={`${base}/labels.pdf`} target="_blank" rel="noopener">
            Open the box labels (PDF)
          </a>
          <a className={link} href={`${base}/labels.pdf?download=1`} download>
            Download the labels
          </a>
        </>
      ) : null}
    </nav>
  );
}
