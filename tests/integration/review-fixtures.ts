import { confirmImport, listSchedule } from "@/lib/server/schedules";
import { createLayout } from "@/lib/server/layouts";
import { createSite } from "@/lib/server/sites";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import { makeOrganisation } from "./support";

// A site with three detectors on the large family and a layout of them, for the review and commissioning tests.
const csv = [
  "label,type,area,room,cable_m,gauge,supervision",
  "Front door,contact-door-surface,Ground,Hall,12,22 AWG,shared-ok",
  "Back door,contact-door-recessed,Ground,Kitchen,30,22 AWG,shared-ok",
  "Hall motion,motion-wall,Ground,Hall,18,22 AWG,single-eol",
].join("\n");

export function documentFor(schedule: ScheduleDetector[], n = schedule.length): LayoutDocument {
  return {
    panelId: "panel-large-32",
    boards: [],
    inputs: schedule.slice(0, n).map((d, i) => ({ boardKey: "panel", input: i + 1, detectorIds: [d.id], scheme: "single-eol", placement: "at-detector" })),
    power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 },
    busCableM: 20,
  };
}

export async function reviewFixture(label = "Review") {
  const o = await makeOrganisation(label);
  const site = await createSite(o.actors.designer, { name: `${label} site`, address: "", description: "", areas: [] });
  await confirmImport(o.actors.designer, site.id, csv, undefined, true);
  const schedule = await listSchedule(o.actors.designer, site.id);
  const { layout } = await createLayout(o.actors.designer, site.id, { name: "Option A", document: documentFor(schedule) });
  return { ...o, site, schedule, layout };
}
