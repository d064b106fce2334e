import { z } from "zod";
import type { ZxcvbnFactory } from "@zxcvbn-ts/core";

// bcrypt reads only the first 72 bytes of a password (bcryptjs README); longer ones are refused rather than
// silently cut. Refused, not pre-hashed: pre-hashing would change how every stored hash is checked.
export const MAX_PASSWORD_BYTES = 72;
// zxcvbn scores 0–4; 3 means an estimated 10^8 to 10^10 guesses (zxcvbn-ts TimeEstimates thresholds).
export const MIN_STRENGTH_SCORE = 3;

// bcrypt cost of every stored password (2^12 rounds). Demo users use it too: sign-in compares an unknown
// e-mail against a dummy hash of this cost, and a cheaper real hash would tell known e-mails apart by time.
export const PASSWORD_HASH_COST = 12;

export const utf8Length = (p: string) => new TextEncoder().encode(p).length;

// Minimum shape: length first (it matters most), plus a mix, and not one repeated character.
// The strength check (passwordStrengthProblem) runs on top of this where a password is set.
export const passwordSchema = z
  .string()
  .min(10, "Use at least 10 characters")
  .max(200, "Use at most 200 characters")
  .refine((p) => utf8Length(p) <= MAX_PASSWORD_BYTES, `Use at most ${MAX_PASSWORD_BYTES} bytes (72 plain letters or digits; accented letters and symbols count double or more)`)
  .refine((p) => /[a-zA-Z]/.test(p) && /[^a-zA-Z]/.test(p), "Mix letters with digits or symbols")
  .refine((p) => new Set(p).size >= 5, "Use at least 5 different characters");

/** The words of a person's name and e-mail address, which a password must not be built from. */
export function personalWords(person: { name?: string | null; email?: string | null }): string[] {
  const words = new Set<string>();
  const split = (text: string | null | undefined) => (text ?? "").toLowerCase().split(/[^\p{L}\p{N}]+/u).filter((w) => w.length >= 3);
  const add = (text: string | null | undefined) => split(text).forEach((w) => words.add(w));
  add(person.name);
  // The whole name as one word, in either order and with the usual separators, so "Ada-Quill-1" counts as known.
  const nameWords = split(person.name);
  if (nameWords.length > 1)
    for (const order of [nameWords, [...nameWords].reverse()]) for (const sep of ["", "-", ".", "_", " "]) words.add(order.join(sep));
  if (person.email) {
    const [local, domain] = person.email.toLowerCase().split("@");
    words.add(local);
    add(local);
    add(domain);
  }
  return [...words];
}

// The dictionaries are large (about 1 MB): loaded on first use, never on page load.
let checker: Promise<ZxcvbnFactory> | undefined;
function loadChecker(): Promise<ZxcvbnFactory> {
  checker ??= Promise.all([import("@zxcvbn-ts/core"), import("@zxcvbn-ts/language-common"), import("@zxcvbn-ts/language-en")]).then(
    ([core, common, en]) =>
      new core.ZxcvbnFactory({
        dictionary: { ...common.dictionary, ...en.dictionary },
        graphs: common.adjacencyGraphs,
        translations: en.translations,
      }),
  );
  return checker;
}

/**
 * Why a password is too easy to guess, or null when it is strong enough. The person's name and
 * e-mail words count as known to an attacker, so a password built from them scores low.
 */
export async function passwordStrengthProblem(password: string, person: { name?: string | null; email?: string | null }): Promise<string | null> {
  const zxcvbn = await loadChecker();
  const result = zxcvbn.check(password, personalWords(person));
  if (result.score >= MIN_STRENGTH_SCORE) return null;
  const hint = [result.feedback.warning, ...result.feedback.suggestions].filter(Boolean).join(" ");
  return `This password is too easy to guess.${hint ? ` ${hint}` : ""} A few unrelated words together make a strong one.`;
}
