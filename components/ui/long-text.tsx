/**
 * Text of any length in a table cell or a card: it wraps (breaking a word only when the word alone is wider than
 * the cell) and, past `lines` lines, is cut with "…"; the whole text shows on hover and on keyboard focus.
 */
export function LongText({ text, lines = 2, className = "" }: { text: string; lines?: 1 | 2 | 3; className?: string }) {
  const clamp = lines === 1 ? "line-clamp-1" : lines === 2 ? "line-clamp-2" : "line-clamp-3";
  // short text needs no focus stop; 40 characters fit two lines of the narrowest column used
  if (text.length <= 40) return <span className={`[overflow-wrap:anywhere] ${className}`}>{text}</span>;
  return (
    <span tabIndex={0} title={text} className={`${clamp} rounded [overflow-wrap:anywhere] hover:line-clamp-none focus:line-clamp-none ${className}`}>
      {text}
    </span>
  );
}
