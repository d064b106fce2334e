import type { LayoutDocument } from "@/lib/layout/schema";

// Unsaved editor changes kept in the browser, so that nothing is lost to a closed tab, a crash or a failed save.

export interface LocalDraft {
  layoutId: number;
  /** The server version the changes were made on. */
  baseVersion: number;
  document: LayoutDocument;
  savedAt: string;
}

const key = (layoutId: number) => `loopwright:layout-draft:${layoutId}`;

export function readDraft(layoutId: number): LocalDraft | null {
  try {
    const text = window.localStorage.getItem(key(layoutId));
    if (!text) return null;
    const d = JSON.parse(text) as LocalDraft;
    return d && d.layoutId === layoutId && typeof d.baseVersion === "number" && d.document ? d : null;
  } catch {
    return null;
  }
}

export function writeDraft(d: LocalDraft): void {
  try {
    window.localStorage.setItem(key(d.layoutId), JSON.stringify(d));
  } catch {
    // storage full or disabled: the autosave still runs, only the crash copy is missing
  }
}

export function clearDraft(layoutId: number): void {
  try {
    window.localStorage.removeItem(key(layoutId));
  } catch {
    // nothing to clear
  }
}
