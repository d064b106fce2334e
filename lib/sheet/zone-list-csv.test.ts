import { describe, expect, it } from "vitest";
import { readCsv } from "@/lib/csv/csv";
import { ZONE_PROGRAMMING_COLUMNS, zoneProgrammingCsv } from "@/lib/sheet/zone-list-csv";
import type { ZoneList } from "@/lib/sheet/zone-list";

const list: ZoneList = {
  zoneLabelLength: 12,
  cutLabels: 1,
  rows: [
    { number: 1, detectorId: "a", label: "Front door", keypadLabel: "Front door", cutOff: "", type: "entry-exit", typeText: "entry/exit", area: "Shop", partSet: false, options: "entry 30 s, exit 45 s", input: "Control panel, input 1 (1+ / 1−)", wireless: false, resistors: "end-of-line resistor 4.7 kΩ" },
    { number: 2, detectorId: "b", label: "=Stock room motion", keypadLabel: "=Stock room ", cutOff: "motion", type: "instant", typeText: "instant", area: null, partSet: true, options: "", input: "Wireless receiver 1 (wireless)", wireless: true, resistors: "none (wireless)" },
  ],
};

describe("the zone list CSV", () => {
  it("has our columns and one record per zone, read back as written (formula guard included)", () => {
    const { records, error } = readCsv(zoneProgrammingCsv(list));
    expect(error).toBeNull();
    expect(records[0]).toEqual([...ZONE_PROGRAMMING_COLUMNS]);
    expect(records.slice(1)).toEqual([
      ["1", "Front door", "", "Front door", "entry/exit", "Shop", "no", "entry 30 s, exit 45 s", "no", "Control panel, input 1 (1+ / 1−)", "end-of-line resistor 4.7 kΩ"],
      ["2", "=Stock room ", "motion", "=Stock room motion", "instant", "", "yes", "", "yes", "Wireless receiver 1 (wireless)", "none (wireless)"],
    ]);
    // a label starting with "=" is written with a quote in front, so a spreadsheet shows it as text (OWASP "CSV injection")
    expect(zoneProgrammingCsv(list)).toContain("'=Stock room motion");
  });
});
