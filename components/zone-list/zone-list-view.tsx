import Link from "next/link";
import type { ZoneListView as View } from "@/lib/server/sheets";
import { zoneListLengthNote } from "@/lib/sheet/zone-list-words";
import { plural } from "@/lib/vocabulary/plural";
import { LifeSafetyCaution } from "@/components/ui/life-safety-caution";
import { ZoneListTable } from "@/components/zone-list/zone-list-table";

/** The zone list for programming on screen, with its PDF and CSV downloads. */
export function ZoneListView({ view }: { view: View }) {
  const { meta, list } = view;
  const rev = `revision=${meta.revision}`;
  const wireless = list.rows.filter((r) => r.wireless).length;
  return (
    <div className="min-w-0" data-testid="zone-list">
      <div className="no-print mb-4 flex flex-wrap items-center gap-3 rounded-lg border border-line bg-white p-3 text-sm">
        <a className="rounded-md bg-signal px-3 py-2 font-medium text-white hover:bg-[#0c5a5a]" href={`/api/layouts/${view.layoutId}/zones/pdf?${rev}`} data-testid="zone-list-pdf">
          Download PDF
        </a>
        <a className="text-signal underline" href={`/api/layouts/${view.layoutId}/zones/csv?${rev}`} data-testid="zone-list-csv">
          Download CSV
        </a>
        <Link className="text-signal underline sm:ml-auto" href={`/sites/${view.siteId}/layouts/${view.layoutId}/sheet?${rev}`}>
          Terminal sheet of this revision
        </Link>
      </div>
      <header className="mb-3">
        <h2 className="break-words text-xl font-semibold">Zone list for programming — {meta.siteName}</h2>
        <p className="text-sm" data-testid="zone-list-summary">
          Layout “{meta.layoutName}”, revision {meta.revision} · {view.panelName ?? "no control panel"} · {plural(list.rows.length, "zone")}
          {wireless ? ` (${wireless} wireless)` : ""} · generated {meta.generatedAt}
        </p>
        {view.approved ? (
          <p className="mt-1 text-sm font-semibold text-signal" data-testid="zone-list-approval">
            Approved revision {meta.revision}: key the panel in from this list.
            {view.frozen ? <span className="ml-1 font-normal text-slate-700">Read from the schedule and catalog frozen at approval.</span> : null}
          </p>
        ) : (
          <p className="mt-2 rounded-md border-2 border-fault bg-fault-soft px-3 py-2 text-base font-bold uppercase tracking-wide text-fault" data-testid="zone-list-approval">
            Not approved — for review only
          </p>
        )}
        {view.caution ? (
          <LifeSafetyCaution className="mt-2">
            {view.caution}
          </LifeSafetyCaution>
        ) : null}
        <p className="mt-2 text-xs text-slate-700" data-testid="zone-label-note">
          {zoneListLengthNote(list, "struck through")}
        </p>
      </header>
      {list.rows.length ? <ZoneListTable rows={list.rows} /> : <p className="text-sm">No zone yet: no detector is on an input or a wireless receiver.</p>}
    </div>
  );
}
