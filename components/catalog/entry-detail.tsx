import Link from "next/link";
import { entryFigures } from "@/lib/catalog/figures";
import { kindLabel } from "@/lib/catalog/kinds";
import type { CatalogEntry } from "@/lib/catalog/loader";
import { catalogKinds, type Catalog, type CatalogKind, type InputType } from "@/lib/catalog/schema";
import { formatOhms, formatOhmsRange } from "@/lib/resistors/format-ohms";
import { Card } from "@/components/ui/card";
import { BandScale } from "./band-scale";
import { readingMarks } from "./band-scale-geometry";
import { reportLabel, schemeLabel, stateLabel } from "./catalog-words";

/** Every figure of an entry with its unit and the field it comes from (the name to use in an upload). */
/** `money` writes the list price as the organisation writes money (lib/format). */
export function FiguresTable({ kind, entry, money }: { kind: CatalogKind; entry: CatalogEntry; money: (amount: number) => string }) {
  const figures = entryFigures(kind, entry);
  const price = "listPrice" in entry ? entry.listPrice : null;
  return (
    <table className="w-full text-sm" data-testid="entry-figures">
      <tbody>
        {figures.map((f) => (
          <tr key={f.key} className="border-t border-line first:border-t-0">
            <th scope="row" className="py-1.5 pr-3 text-left font-medium">
              {f.label}
            </th>
            <td className="py-1.5 pr-3 tabular-nums">
              {f.value}
              {f.unit ? ` ${f.unit}` : ""}
            </td>
            <td className="py-1.5 font-mono text-xs text-slate-500">{f.key}</td>
          </tr>
        ))}
        {price !== null ? (
          <tr className="border-t border-line">
            <th scope="row" className="py-1.5 pr-3 text-left font-medium">
              List price
            </th>
            <td className="py-1.5 pr-3 tabular-nums">{money(price)}</td>
            <td className="py-1.5 font-mono text-xs text-slate-500">listPrice</td>
          </tr>
        ) : null}
      </tbody>
    </table>
  );
}

/** The band scale, the band table and the expected readings of each scheme of an input type. */
export function InputTypeBands({ inputType }: { inputType: InputType }) {
  return (
    <>
      {inputType.schemes.map((scheme) => {
        const bands = inputType.bands[scheme] ?? [];
        const { marks } = readingMarks(inputType, scheme);
        return (
          <Card key={scheme} className="mb-4" data-testid={`scheme-${scheme}`}>
            <h3 className="font-semibold">{schemeLabel[scheme]}</h3>
            <BandScale inputType={inputType} scheme={scheme} />
            <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
              <table className="self-start text-sm">
                <caption className="text-left text-xs font-medium text-slate-500">Bands: a reading from (inclusive) up to (exclusive) gives the report</caption>
                <thead className="text-left text-slate-500">
                  <tr>
                    <th className="py-1 pr-3">Report</th>
                    <th className="pr-3">From</th>
                    <th>Up to</th>
                  </tr>
                </thead>
                <tbody>
                  {bands.map((b, i) => (
                    <tr key={i} className="border-t border-line">
                      <td className="py-1 pr-3">{reportLabel[b.report]}</td>
                      <td className="pr-3 tabular-nums">{formatOhms(b.fromOhms)}</td>
                      <td className="tabular-nums">{b.toOhms === null ? "∞" : formatOhms(b.toOhms)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              <table className="self-start text-sm">
                <caption className="text-left text-xs font-medium text-slate-500">
                  Expected readings of a sound loop ({inputType.tolerancePct}% parts, up to {formatOhms(inputType.maxLoopOhms)} of cable)
                </caption>
                <thead className="text-left text-slate-500">
                  <tr>
                    <th className="py-1 pr-3">Loop</th>
                    <th className="pr-3">Nominal</th>
                    <th className="pr-3">Range</th>
                    <th>Report</th>
                  </tr>
                </thead>
                <tbody>
                  {marks.map((m) => (
                    <tr key={m.state} className="border-t border-line">
                      <td className="py-1 pr-3">{stateLabel[m.state]}</td>
                      <td className="pr-3 tabular-nums">{formatOhms(m.nominalOhms)}</td>
                      <td className="pr-3 tabular-nums">{formatOhmsRange(m.minOhms, m.maxOhms)}</td>
                      <td>{reportLabel[m.report]}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </Card>
        );
      })}
    </>
  );
}

function entriesOf(catalog: Catalog): { kind: CatalogKind; entry: CatalogEntry }[] {
  return catalogKinds.flatMap((kind) => (catalog[kind] as CatalogEntry[]).map((entry) => ({ kind, entry })));
}

/** Entries tied to this one: hardware with inputs of an input type; the family's hardware for a panel; the panels a board, keypad or power supply fits. */
export function relatedEntries(catalog: Catalog, kind: CatalogKind, entry: CatalogEntry): { kind: CatalogKind; id: string; name: string; why: string }[] {
  const all = entriesOf(catalog);
  const inputTypeOf = (e: CatalogEntry) => ("onboardInputs" in e ? e.onboardInputs.inputType : "inputs" in e ? e.inputs?.inputType : undefined);
  const familiesOf = (e: CatalogEntry) => ("families" in e ? e.families : "family" in e ? [e.family] : []);
  const out: { kind: CatalogKind; id: string; name: string; why: string }[] = [];
  if (kind === "inputTypes") for (const r of all) if (inputTypeOf(r.entry) === entry.id) out.push({ kind: r.kind, id: r.entry.id, name: r.entry.name, why: "inputs of this type" });
  const fams = familiesOf(entry);
  if (kind === "panels") for (const r of all) if (r.kind !== "panels" && familiesOf(r.entry).some((f) => fams.includes(f))) out.push({ kind: r.kind, id: r.entry.id, name: r.entry.name, why: `family ${fams[0]}` });
  if (kind === "expansionBoards" || kind === "keypads" || kind === "powerSupplies")
    for (const r of all) if (r.kind === "panels" && familiesOf(r.entry).some((f) => fams.includes(f))) out.push({ kind: r.kind, id: r.entry.id, name: r.entry.name, why: `family ${familiesOf(r.entry)[0]}` });
  const it = inputTypeOf(entry);
  if (it) {
    const t = catalog.inputTypes.find((x) => x.id === it);
    if (t) out.push({ kind: "inputTypes", id: t.id, name: t.name, why: "its inputs" });
  }
  return out;
}

export function RelatedList({ items }: { items: ReturnType<typeof relatedEntries> }) {
  if (!items.length) return null;
  return (
    <ul className="space-y-1 text-sm">
      {items.map((r) => (
        <li key={`${r.kind}:${r.id}`}>
          <Link className="text-signal underline underline-offset-2" href={`/catalog/${r.id}`}>
            {r.name}
          </Link>{" "}
          <span className="text-slate-500">
            {kindLabel[r.kind]} · {r.why}
          </span>
        </li>
      ))}
    </ul>
  );
}
