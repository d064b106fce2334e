// Prop comparison for the editor's memoised slots and chips. A solve builds new finding lists each time, but the
// findings in them are the same objects when nothing about their target changed, so lists compare item by item.

export function sameItems<T>(a: readonly T[] | undefined, b: readonly T[] | undefined): boolean {
  if (a === b) return true;
  if (!a || !b || a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** Equal when every prop is the same value, list props (`lists`) compared item by item. */
export function samePropsWithLists<P extends object>(lists: readonly (keyof P)[]) {
  return (a: P, b: P): boolean => {
    for (const k of Object.keys(a) as (keyof P)[]) {
      if (lists.includes(k)) {
        if (!sameItems(a[k] as unknown[] | undefined, b[k] as unknown[] | undefined)) return false;
      } else if (!Object.is(a[k], b[k])) return false;
    }
    return Object.keys(a).length === Object.keys(b).length;
  };
}
