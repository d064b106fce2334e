import type { ZoneListRow } from "@/lib/sheet/zone-list";

const TH = "border border-line bg-slate-50 px-1.5 py-1 text-left font-semibold";
const TD = "border border-line px-1.5 py-1 align-top";

/** What the keypad shows, then the part it cuts off struck through, so the cut is seen where it falls. */
export function KeypadLabel({ row }: { row: Pick<ZoneListRow, "keypadLabel" | "cutOff"> }) {
  return (
    <span className="font-mono">
      <span data-testid="keypad-label">{row.keypadLabel}</span>
      {row.cutOff ? (
        <>
          <span aria-hidden="true" className="text-fault">
            ✂
          </span>
          <del className="text-slate-500" data-testid="label-cut-off">
            <span className="sr-only">, cut off: </span>
            {row.cutOff}
          </del>
        </>
      ) : null}
    </span>
  );
}

/** Every zone, one row each, as it is keyed into the panel. */
export function ZoneListTable({ rows }: { rows: ZoneListRow[] }) {
  return (
    <div className="relative overflow-x-auto rounded-md border border-line bg-white" tabIndex={0} aria-label="Zone list, scrolls sideways">
      <table className="w-full border-collapse text-sm" data-testid="zone-list-table">
        <thead>
          <tr>
            <th className={TH}>Zone</th>
            <th className={TH}>Keypad label</th>
            <th className={TH}>Type</th>
            <th className={TH}>Area</th>
            <th className={TH}>Part-set</th>
            <th className={TH}>Options</th>
            <th className={TH}>Input</th>
            <th className={TH}>Resistors</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.detectorId} data-testid={`zone-row-${r.number}`} data-wireless={r.wireless ? "" : undefined}>
              <td className={`${TD} tabular-nums`}>{r.number}</td>
              <td className={TD}>
                <KeypadLabel row={r} />
              </td>
              <td className={TD}>{r.typeText}</td>
              <td className={TD}>{r.area ?? "—"}</td>
              <td className={TD}>{r.partSet ? "yes" : "no"}</td>
              <td className={TD}>{r.options || "—"}</td>
              <td className={TD}>{r.input}</td>
              <td className={TD}>{r.resistors}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
