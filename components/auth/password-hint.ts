export const PASSWORD_HINT = "At least 10 characters with letters and digits or symbols, hard to guess and not built from your name or e-mail; a few unrelated words work well. At most 72 bytes.";

/** The strength rule the server applies too, loaded only when the form is sent (its dictionaries are large). */
export async function strengthProblem(password: string, person: { name?: string; email?: string }): Promise<string | null> {
  const rule = await import("@/lib/auth/password");
  return rule.passwordStrengthProblem(password, person).catch(() => null); // the server checks again
}
