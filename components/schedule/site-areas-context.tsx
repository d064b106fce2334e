"use client";

import { createContext, useContext, useState, type ReactNode } from "react";
import type { SiteArea } from "@/components/schedule/schedule-labels";

// The site's areas and rooms for every detector form of the schedule page; "add a new room" updates them for all.
interface SiteAreasValue {
  siteId: number;
  areas: SiteArea[];
  setAreas: (areas: SiteArea[]) => void;
  canAddRooms: boolean;
}

const SiteAreasContext = createContext<SiteAreasValue | null>(null);

export function SiteAreasProvider({ siteId, initial, canAddRooms, children }: { siteId: number; initial: SiteArea[]; canAddRooms: boolean; children: ReactNode }) {
  const [areas, setAreas] = useState(initial);
  return <SiteAreasContext.Provider value={{ siteId, areas, setAreas, canAddRooms }}>{children}</SiteAreasContext.Provider>;
}

export function useSiteAreas(): SiteAreasValue | null {
  return useContext(SiteAreasContext);
}
