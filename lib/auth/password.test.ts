import { describe, expect, it } from "vitest";
import { MAX_PASSWORD_BYTES, passwordSchema, passwordStrengthProblem, personalWords, utf8Length } from "./password";
import { DEMO_PASSWORD } from "@/scripts/demo/seed-demo";

const person = { name: "Ada Quillfenmore", email: "ada.quillfenmore@marrowtek.example" };
const stranger = { name: "Bo Tern", email: "bo@tern.example" };

describe("password rule", () => {
  it("keeps the shape rules: length, a mix, several different characters", () => {
    expect(passwordSchema.safeParse("short1").success).toBe(false);
    expect(passwordSchema.safeParse("onlyletterslong").success).toBe(false);
    expect(passwordSchema.safeParse("aaaa1111aaaa").success).toBe(false);
    expect(passwordSchema.safeParse("gravel-lantern-19").success).toBe(true);
  });

  it("refuses more than 72 bytes of UTF-8, which bcrypt would silently cut", () => {
    // bcryptjs README: "The maximum input length is 72 bytes"
    const ascii72 = "gravel-lantern-".repeat(5).slice(0, 72);
    expect(utf8Length(ascii72)).toBe(72);
    expect(passwordSchema.safeParse(ascii72).success).toBe(true);
    expect(passwordSchema.safeParse(`${ascii72}x`).success).toBe(false);
    // 36 two-byte letters make 72 bytes; a 37th is over although only 40 characters long
    const accented = `${"é".repeat(36)}1234`;
    expect(accented.length).toBe(40);
    const r = passwordSchema.safeParse(accented);
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.message).join(" ")).toContain(`${MAX_PASSWORD_BYTES} bytes`);
  });

  it("refuses common passwords however they are shaped", async () => {
    for (const p of ["password12", "qwerty1234"]) {
      expect(passwordSchema.safeParse(p).success).toBe(true);
      expect(await passwordStrengthProblem(p, stranger)).toMatch(/too easy to guess/);
    }
  });

  it("refuses passwords built from the person's own name or e-mail, which pass for someone else", async () => {
    for (const p of ["quillfenmore2026", "marrowtek2026!", "adaquillfenmore", "Ada-Quillfenmore-1"]) {
      expect(await passwordStrengthProblem(p, person)).toMatch(/too easy to guess/);
      expect(await passwordStrengthProblem(p, stranger)).toBeNull();
    }
  });

  it("accepts unrelated words together, and the demo password", async () => {
    expect(await passwordStrengthProblem("gravel lantern otter 19", person)).toBeNull();
    expect(await passwordStrengthProblem(DEMO_PASSWORD, person)).toBeNull();
  });

  it("lists the name and e-mail words as the attacker's known words", () => {
    expect(personalWords(person)).toEqual(expect.arrayContaining(["ada", "quillfenmore", "ada.quillfenmore", "marrowtek"]));
    expect(personalWords({})).toEqual([]);
  });
});
