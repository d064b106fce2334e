import type { SupervisionPreference } from "@/lib/schedule/schema";

export interface DetectorType {
  id: string;
  name: string;
  category: string;
  lifeSafety: boolean;
}

export interface SiteArea {
  name: string;
  rooms: string[];
}

export const supervisionLabels: Record<SupervisionPreference, string> = {
  "double-eol": "double end-of-line",
  "single-eol": "single end-of-line",
  "shared-ok": "may share an input",
  none: "no resistor",
};
