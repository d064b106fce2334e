import type { SupervisionPreference } from "@/lib/schedule/schema";
import { SUPERVISION_WORDS } from "@/lib/vocabulary/words";

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

export const supervisionLabels: Record<SupervisionPreference, string> = SUPERVISION_WORDS;
