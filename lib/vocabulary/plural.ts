// The one way a count is worded, everywhere a person reads it: "1 input", "2 inputs", "0 errors".
// English plural categories from Intl.PluralRules ("one" for exactly 1, "other" for the rest).

const rules = new Intl.PluralRules("en");

/** The word alone, agreeing with the count: pluralWord(1, "input") → "input"; pluralWord(2, "is", "are") → "are". */
export function pluralWord(n: number, one: string, many = `${one}s`): string {
  return rules.select(n) === "one" ? one : many;
}

/** The count and its word: plural(1, "board") → "1 board"; plural(3, "battery", "batteries") → "3 batteries". */
export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${pluralWord(n, one, many)}`;
}
