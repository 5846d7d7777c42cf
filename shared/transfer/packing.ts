import type { PackingFindingDto } from "../schemas/transfer";

type Box = { id: string; label: string };
type Line = { id: string; containerId: string | null; taxonId: string; scientificName: string };

/**
 * Packing problems the sender must resolve before the receiver is asked to confirm.
 * Different species never share a compartment: CITES guidelines for the non-air transport
 * of live wild animals (Rp/3, 1.41) and common practice for shipped reptiles.
 */
export function packingFindings(boxes: readonly Box[], lines: readonly Line[]): PackingFindingDto[] {
  const findings: PackingFindingDto[] = [];
  if (lines.length === 0)
    findings.push({ code: "no_animals", containerId: null, animalIds: [], message: "Add the animals that travel." });
  if (boxes.length === 0)
    findings.push({
      code: "no_boxes",
      containerId: null,
      animalIds: [],
      message: "Add the boxes the animals travel in.",
    });

  const unpacked = lines.filter((l) => l.containerId === null);
  if (unpacked.length > 0 && boxes.length > 0) {
    findings.push({
      code: "unpacked_animal",
      containerId: null,
      animalIds: unpacked.map((l) => l.id),
      message: `${unpacked.length === 1 ? "One animal line is" : `${unpacked.length} animal lines are`} not in a box yet.`,
    });
  }
  for (const box of boxes) {
    const inBox = lines.filter((l) => l.containerId === box.id);
    if (inBox.length === 0) {
      findings.push({
        code: "empty_box",
        containerId: box.id,
        animalIds: [],
        message: `${box.label} has no animals: remove it or pack something in it.`,
      });
      continue;
    }
    const species = [...new Set(inBox.map((l) => l.scientificName))];
    if (species.length > 1) {
      findings.push({
        code: "mixed_species",
        containerId: box.id,
        animalIds: inBox.map((l) => l.id),
        message: `${box.label} holds ${species.join(" and ")}. Different species must not share a box (CITES transport guideline Rp/3 1.41): move them into their own boxes.`,
      });
    }
  }
  return findings;
}
