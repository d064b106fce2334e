import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { attachmentHeader, contentDisposition } from "./content-disposition";

// RFC 6266 section 4.1: filename="quoted ASCII" plus filename*=UTF-8''percent-encoded (RFC 8187 / RFC 5987)
const shape = /^(attachment|inline); filename="([A-Za-z0-9._\-()+ ]+)"; filename\*=UTF-8''([A-Za-z0-9!#$&+\-.^_`|~%]+)$/;

describe("attachmentHeader", () => {
  it("keeps an ordinary name as it is", () => {
    expect(attachmentHeader("terminal-sheet-marrowbank-rev-1.pdf")).toBe(`attachment; filename="terminal-sheet-marrowbank-rev-1.pdf"; filename*=UTF-8''terminal-sheet-marrowbank-rev-1.pdf`);
  });

  it("gives non-ASCII names an ASCII fallback and the UTF-8 name in filename*", () => {
    const h = attachmentHeader("Bibliothèque Öst – 東.csv");
    const m = shape.exec(h)!;
    expect(m[2]).toBe("Bibliotheque Ost _ _.csv");
    expect(decodeURIComponent(m[3])).toBe("Bibliothèque Öst – 東.csv");
  });

  const hostile: [string, (m: RegExpExecArray) => void][] = [
    ['say "hi".pdf', (m) => expect(m[2]).toBe("say _hi_.pdf")],
    ["a\r\nSet-Cookie: x=1.csv", (m) => expect(decodeURIComponent(m[3])).toBe("aSet-Cookie_ x=1.csv")],
    ["../../etc/passwd", (m) => expect(m[2]).toBe("_.._etc_passwd")],
    ["..\\..\\boot.ini", (m) => expect(m[2]).toBe("_.._boot.ini")],
    [".hidden", (m) => expect(m[2]).toBe("hidden")],
    ["semi;colon=1.pdf", (m) => expect(m[2]).toBe("semi_colon=1.pdf".replace("=", "_"))],
    ["nul\u0000byte.pdf", (m) => expect(m[2]).toBe("nulbyte.pdf")],
    ["lone\ud800surrogate.pdf", (m) => expect(decodeURIComponent(m[3])).toBe("lonesurrogate.pdf")],
    ["", (m) => expect(m[2]).toBe("download")],
    ["\u202eevil\u202dfdp.exe", (m) => expect(m[2]).not.toMatch(/[^\x20-\x7e]/)],
    ["x".repeat(1000) + ".pdf", (m) => expect(decodeURIComponent(m[3]).length).toBeLessThanOrEqual(150)],
  ];
  for (const [name, check] of hostile)
    it(`makes ${JSON.stringify(name.slice(0, 30))} safe`, () => {
      const h = attachmentHeader(name);
      const m = shape.exec(h);
      expect(m, h).not.toBeNull();
      check(m!);
    });

  it("always has the safe shape and never a CR, LF, quote or slash in a name (property)", () => {
    fc.assert(
      fc.property(fc.string({ unit: "binary", maxLength: 200 }), fc.constantFrom("attachment", "inline") as fc.Arbitrary<"attachment" | "inline">, (name, kind) => {
        const h = contentDisposition(kind, name);
        const m = shape.exec(h);
        expect(m, JSON.stringify(h)).not.toBeNull();
        const utf8 = decodeURIComponent(m![3]);
        expect(utf8).not.toMatch(/[\u0000-\u001f\u007f"\\/]/);
        expect(utf8.startsWith(".")).toBe(false);
      }),
      { numRuns: 2000 },
    );
  });
});
