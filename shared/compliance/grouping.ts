import type { Finding } from "./schemas";

/** Two findings say the same thing: same rule and version, same outcome, same words. */
function sameFinding(a: Finding, b: Finding): boolean {
  if (a === b) return true;
  return (
    a.ruleId === b.ruleId &&
    a.ruleVersion === b.ruleVersion &&
    a.severity === b.severity &&
    a.message === b.message &&
    a.missing === b.missing &&
    JSON.stringify(a.satisfiedBy) === JSON.stringify(b.satisfiedBy)
  );
}

/**
 * Splits an evaluation's findings into those that apply to the whole shipment and those that
 * differ per animal line. A finding is shipment-wide when every line carries it, word for word,
 * and it names none of the lines (the Lacey Act, box marking): it is said once, above the lines,
 * and left out of each line's list. Everything else stays on its line, in its order.
 */
export function groupShipmentFindings<Line extends { scientificName: string; findings: readonly Finding[] }>(
  lines: readonly Line[],
): { shipmentFindings: Finding[]; animals: (Omit<Line, "findings"> & { findings: Finding[] })[] } {
  const [first, ...rest] = lines;
  if (!first) return { shipmentFindings: [], animals: [] };
  const names = lines.map((line) => line.scientificName);
  const shipmentFindings = first.findings.filter(
    (finding) =>
      rest.every((line) => line.findings.some((other) => sameFinding(finding, other))) &&
      !names.some((name) => name !== "" && finding.message.includes(name)),
  );
  const isShipmentWide = (finding: Finding) => shipmentFindings.some((shared) => sameFinding(shared, finding));
  return {
    shipmentFindings,
    animals: lines.map((line) => ({ ...line, findings: line.findings.filter((finding) => !isShipmentWide(finding)) })),
  };
}
