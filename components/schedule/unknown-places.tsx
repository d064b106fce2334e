import type { UnknownPlace } from "@/lib/sites/places";
import { describePlace } from "@/lib/sites/places";

/** The areas and rooms an import names that the site lacks, and the question whether to add them. */
export function UnknownPlaces({ places, add, onAdd }: { places: UnknownPlace[]; add: boolean; onAdd: (add: boolean) => void }) {
  return (
    <div className="mt-2 rounded border border-amber-400 bg-amber-50 p-2 text-sm" data-testid="import-unknown-places">
      <p className="font-medium">
        The file names {places.length} area{places.length === 1 ? "" : "s"} or room{places.length === 1 ? "" : "s"} this site does not have. Check the spelling: add them to the site, or correct the file and choose it again.
      </p>
      <ul className="mt-1 list-disc pl-5 text-xs">
        {places.map((p) => (
          <li key={`${p.area}/${p.room ?? ""}`}>
            {describePlace(p)} (row{p.rows.length === 1 ? "" : "s"} {p.rows.slice(0, 10).join(", ")}
            {p.rows.length > 10 ? ", …" : ""})
          </li>
        ))}
      </ul>
      <label className="mt-2 flex items-center gap-2">
        <input type="checkbox" checked={add} onChange={(e) => onAdd(e.target.checked)} />
        Add {places.length === 1 ? "it" : "them"} to the site&apos;s structure (new areas go on the last floor)
      </label>
    </div>
  );
}
