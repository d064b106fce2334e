import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { detectorCategorySchema, reportSchema, wiringSchemeSchema } from "@/lib/catalog/schema";
import { placementSchema } from "@/lib/loop/loop-schema";
import { supervisionPreferenceSchema } from "@/lib/schedule/schema";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { largeLayout, largeSchedule, midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { CATEGORY_WORDS, PLACEMENT_WORDS, REPORT_WORDS, SCHEME_WORDS, SUPERVISION_WORDS, sentence, sentenceWords } from "@/lib/vocabulary/words";

const { catalog } = shippedCatalog();

describe("the vocabulary", () => {
  it("uses the glossary's words for schemes, placements and reports", () => {
    // /work/shared/GLOSSARY.md and DEVELOPERS.md "Vocabulary": trade terms and the project's own words
    expect(SCHEME_WORDS).toMatchObject({ "single-eol": "single end-of-line", "double-eol": "double end-of-line", shared: "shared input" });
    expect(PLACEMENT_WORDS).toMatchObject({ "at-panel": "resistor at the panel", "loop-back": "loop-back resistor" });
    expect(REPORT_WORDS).toMatchObject({ short: "short", open: "open / cut", trouble: "trouble", normal: "normal" });
  });
  it("has one word for every value, and no two values share a word", () => {
    const maps: [Record<string, string>, readonly string[]][] = [
      [SCHEME_WORDS, wiringSchemeSchema.options],
      [PLACEMENT_WORDS, placementSchema.options],
      [REPORT_WORDS, reportSchema.options],
      [CATEGORY_WORDS, detectorCategorySchema.options],
      [SUPERVISION_WORDS, supervisionPreferenceSchema.options],
    ];
    for (const [words, values] of maps) {
      expect(Object.keys(words).sort()).toEqual([...values].sort());
      expect(new Set(Object.values(words)).size).toBe(values.length);
    }
  });
  it("asks for supervision in the scheme words", () => {
    expect(SUPERVISION_WORDS["single-eol"]).toBe(SCHEME_WORDS["single-eol"]);
    expect(SUPERVISION_WORDS.none).toBe(SCHEME_WORDS.none);
  });
  it("capitalises a word to start a label, and nothing else in it", () => {
    expect(sentence("open / cut")).toBe("Open / cut");
    expect(sentence("")).toBe("");
    expect(sentenceWords(SCHEME_WORDS)).toEqual({ none: "No resistor", "single-eol": "Single end-of-line", "double-eol": "Double end-of-line", shared: "Shared input" });
  });
  it("is what the terminal sheet prints", () => {
    let rows = 0;
    for (const [layout, schedule] of [[midLayout, midSchedule], [largeLayout, largeSchedule]] as const)
      for (const b of buildTerminalSheet(layout, schedule, catalog).boards)
        for (const r of b.rows.filter((x): x is SheetInput => !x.spare)) {
          rows++;
          expect(r.schemeText).toBe(SCHEME_WORDS[r.scheme]);
          expect(r.placementText).toBe(r.scheme === "none" ? SCHEME_WORDS.none : PLACEMENT_WORDS[r.placement]);
        }
    expect(rows).toBeGreaterThan(0);
  });
});
