import type { EffectiveReview } from "@/lib/review/effective-state";
import type { CommissioningView, PhotoView, ReadingView } from "@/lib/server/commissioning";

// How the screen's copy of the commissioning view changes after a write, without asking the server again.

/** Readings the server stored, each replacing any copy of itself (a resend returns the same id). */
export function withSavedReadings(view: CommissioningView, saved: readonly ReadingView[]): CommissioningView {
  if (!saved.length) return view;
  const ids = new Set(saved.map((r) => r.id));
  return { ...view, readings: [...view.readings.filter((r) => !ids.has(r.id)), ...saved] };
}

/** A photo the server kept; the same photo sent twice is listed once. */
export function withPhoto(view: CommissioningView, photo: PhotoView): CommissioningView {
  return view.photos.some((p) => p.id === photo.id) ? view : { ...view, photos: [...view.photos, photo] };
}

export function withReview(view: CommissioningView, review: EffectiveReview): CommissioningView {
  return { ...view, review };
}
