import {
  ANIMAL_ORIGIN_WORDS,
  IDENTIFIER_KIND_WORDS,
  LENGTH_KIND_WORDS,
  PACK_WORDS,
  SEX_WORDS,
  WALL_MATERIAL_WORDS,
} from "@shared/words";
import { Link } from "react-router";
import type { AnimalDto, TransferDto } from "@shared/schemas/transfer";
import { TaxonName } from "@/components/ui/taxon-name";
import { paths } from "@/config/paths";
import { formatDate } from "@shared/dates";
import { formatDimensions, formatLength, formatWeight } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";
import { Section } from "./section";

function AnimalRow({ animal: a }: { animal: AnimalDto }) {
  const [system] = useUnitSystem();
  const details = [
    SEX_WORDS[a.sex],
    ANIMAL_ORIGIN_WORDS[a.origin],
    a.identifier ? `${a.identifierKind ? IDENTIFIER_KIND_WORDS[a.identifierKind] : "ID"} ${a.identifier}` : null,
    a.lengthMm != null
      ? `${a.lengthKind ? LENGTH_KIND_WORDS[a.lengthKind].toLowerCase() : "size"} ${formatLength(a.lengthMm, system)}`
      : null,
    a.weightG != null ? formatWeight(a.weightG, system) : null,
    a.hatchDate ? `hatched ${formatDate(a.hatchDate)}` : null,
  ].filter(Boolean);
  return (
    <li className="py-2">
      <p>
        <span className="font-semibold">{a.count} ×</span> <TaxonName taxon={a.taxon} />
      </p>
      <p className="text-sm text-ink-soft">{details.join(" · ")}</p>
      {a.notes ? <p className="whitespace-pre-wrap text-sm">{a.notes}</p> : null}
    </li>
  );
}

/** Each box with its size, walls, pack and seal, and the animals in it. */
export function BoxesSection({ transfer: t }: { transfer: TransferDto }) {
  const [system] = useUnitSystem();
  const boxes = [...t.containers].sort((a, b) => a.position - b.position);
  const animals = [...t.animals].sort((a, b) => a.position - b.position);
  const unpacked = animals.filter((a) => a.containerId === null);
  const total = animals.reduce((n, a) => n + a.count, 0);
  return (
    <Section
      id="boxes"
      title={`Boxes and animals (${total} ${total === 1 ? "animal" : "animals"} in ${boxes.length} ${boxes.length === 1 ? "box" : "boxes"})`}
      actions={
        t.abilities.edit ? (
          <Link
            to={paths.transfers.edit.href(t.id)}
            className="inline-flex min-h-11 items-center px-2 font-medium text-fern underline"
          >
            Change boxes or animals
          </Link>
        ) : null
      }
    >
      <div className="grid gap-3 md:grid-cols-2">
        {boxes.map((box) => (
          <article key={box.id} className="rounded-md border border-rule p-3">
            <h3 className="font-semibold">{box.label}</h3>
            <p className="text-sm text-ink-soft">
              {formatDimensions(box.lengthMm, box.widthMm, box.heightMm, system)} ·{" "}
              {WALL_MATERIAL_WORDS[box.wallMaterial]}, walls {formatLength(box.wallThicknessMm, system)} ·{" "}
              {PACK_WORDS[box.pack]}
              {box.sealNumber ? ` · seal ${box.sealNumber}` : " · no seal number"}
            </p>
            <ul className="divide-y divide-rule">
              {animals
                .filter((a) => a.containerId === box.id)
                .map((a) => (
                  <AnimalRow key={a.id} animal={a} />
                ))}
            </ul>
          </article>
        ))}
        {unpacked.length > 0 ? (
          <article className="rounded-md border border-dashed border-amber-line bg-amber-bg/40 p-3">
            <h3 className="font-semibold">Not in a box yet</h3>
            <ul className="divide-y divide-rule">
              {unpacked.map((a) => (
                <AnimalRow key={a.id} animal={a} />
              ))}
            </ul>
          </article>
        ) : null}
      </div>
      {boxes.length === 0 && animals.length === 0 ? <p className="text-ink-soft">No boxes or animals yet.</p> : null}
    </Section>
  );
}
