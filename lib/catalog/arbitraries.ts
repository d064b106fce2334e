// fast-check arbitraries for valid catalogs (test support only).
import fc from "fast-check";
import { expectedReadings } from "./expected-readings";
import type { Band, Catalog, Detector, ExpansionBoard, InputType, Keypad, OutputBlock, OutputModule, Panel, PowerSupply, Report, Sounder, Strobe, WiringScheme, WirelessDetector, WirelessReceiver, ZoneType } from "./schema";

const tricky = ["yes", "no", "null", "~", "1e3", "0x10", "- item", "a: b", "# not a comment", "'quoted'", '"dq"', " lead", "trail ", "multi\nline", "tab\there", "[x]", "{y}", "*alias", "&anchor", "!tag", "%", "@", "`", "…", "Ω", "µA", "über", "日本"];

export const textArb = (maxLength: number, minLength = 0) =>
  fc.oneof(fc.constantFrom(...tricky), fc.string({ unit: "grapheme", minLength, maxLength }), fc.string({ minLength, maxLength })).filter((s) => s.length >= minLength && s.length <= maxLength);

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((x) => x + 0); // no -0
const int = (min: number, max: number) => fc.integer({ min, max });
const e24 = fc.constantFrom(10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75, 82, 91);
const ohmsArb = fc.tuple(e24, fc.constantFrom(10, 100, 1000)).map(([m, k]) => m * k); // 100 Ω – 91 kΩ

const rawId = fc.stringMatching(/^[a-z0-9-]{0,20}$/);
const idFor = (prefix: string, i: number, raw: string) => `${prefix}${i}${raw ? `-${raw}` : ""}`;

/** Bands that read every expected value right: one band per reading, filler bands between. */
function bandsFor(it: InputType, scheme: WiringScheme, cuts: number[], fillers: Report[]): Band[] | null {
  const readings = expectedReadings(it, scheme);
  if (!readings) return null;
  const sorted = [...readings].sort((a, b) => a.minOhms - b.minOhms);
  for (let i = 1; i < sorted.length; i++) if (sorted[i].minOhms - sorted[i - 1].maxOhms < 4) return null; // too close to tell apart
  const bands: Band[] = [];
  let k = 0;
  const cut = () => cuts[k++ % cuts.length]; // in (0.1, 0.45)
  const fill = () => fillers[k % fillers.length];
  let from = 0;
  if (sorted[0].minOhms > 4) {
    const edge = sorted[0].minOhms * (1 - cut()) ;
    bands.push({ report: fill(), fromOhms: 0, toOhms: edge });
    from = edge;
  }
  sorted.forEach((r, i) => {
    const next = sorted[i + 1];
    const gap = next ? next.minOhms - r.maxOhms : Math.max(r.maxOhms, 10);
    const end = r.maxOhms + gap * cut();
    bands.push({ report: r.report, fromOhms: from, toOhms: end });
    from = end;
    const trouble = r.maxOhms + gap * (1 - cut());
    if (trouble > end) {
      bands.push({ report: next ? "trouble" : fill(), fromOhms: from, toOhms: trouble });
      from = trouble;
    }
  });
  bands.push({ report: fillers.includes("active") ? "active" : "open", fromOhms: from, toOhms: null });
  return bands;
}

export const inputTypeArb = (id: string): fc.Arbitrary<InputType> =>
  fc
    .record({
      name: textArb(120, 1),
      description: textArb(300),
      schemes: fc.uniqueArray(fc.constantFrom<WiringScheme>("none", "single-eol", "double-eol", "shared"), { minLength: 1, maxLength: 4 }),
      eolOhms: ohmsArb,
      alarmOhms: ohmsArb,
      sharedOhms: fc.uniqueArray(ohmsArb, { minLength: 2, maxLength: 2 }) as fc.Arbitrary<number[]>,
      tolerancePct: fc.constantFrom(1, 2, 5, 10),
      maxLoopOhms: fc.oneof(int(1, 200), num(0.5, 200)),
      lifeSafety: fc.boolean(),
      cuts: fc.array(num(0.1, 0.45), { minLength: 1, maxLength: 6 }),
      fillers: fc.array(fc.constantFrom<Report>("trouble", "short", "open", "active"), { minLength: 1, maxLength: 4 }),
    })
    .map((r) => {
      const it: InputType = {
        id,
        name: r.name,
        description: r.description,
        schemes: r.schemes,
        eolOhms: r.eolOhms,
        alarmOhms: r.alarmOhms,
        sharedOhms: [r.sharedOhms[0], r.sharedOhms[1]],
        bands: {},
        tolerancePct: r.tolerancePct,
        maxLoopOhms: r.maxLoopOhms,
        lifeSafety: r.lifeSafety,
      };
      const schemes: WiringScheme[] = [];
      for (const s of r.schemes) {
        const bands = bandsFor(it, s, r.cuts, r.fillers);
        if (bands) {
          it.bands[s] = bands;
          schemes.push(s);
        }
      }
      if (schemes.length === 0) {
        schemes.push("none");
        it.bands.none = bandsFor(it, "none", r.cuts, r.fillers)!;
      }
      it.schemes = schemes;
      if (!schemes.some((s) => s !== "none")) delete it.eolOhms;
      if (!schemes.includes("double-eol")) delete it.alarmOhms;
      if (!schemes.includes("shared")) delete it.sharedOhms;
      return it;
    });

const priced = { name: textArb(120, 1), description: textArb(400), listPrice: fc.oneof(int(0, 5000), num(0, 1e6)) };
const ma = () => fc.oneof(int(0, 3000), num(0, 3000));
const ZONE_TYPES: ZoneType[] = ["instant", "entry-exit", "24-hour", "hold-up", "fire", "tamper", "technical"];
const categories = fc.constantFrom<Detector["category"]>("door-contact", "window-contact", "motion", "glass-break", "vibration", "panic", "water", "temperature", "smoke", "heat");
/** Output blocks as the loader wants them: siren blocks (panels only) before programmable ones. */
const outputBlocksArb = (sirens: boolean): fc.Arbitrary<OutputBlock[]> =>
  fc
    .tuple(
      sirens ? fc.array(fc.record({ count: int(1, 4), switching: fc.constantFrom<OutputBlock["switching"]>("relay", "transistor"), ratingMa: ma() }), { maxLength: 1 }) : fc.constant([]),
      fc.array(fc.record({ count: int(1, 16), switching: fc.constantFrom<OutputBlock["switching"]>("relay", "transistor"), ratingMa: ma() }), { minLength: sirens ? 0 : 1, maxLength: 2 }),
    )
    .map(([si, pr]) => [...si.map((b) => ({ purpose: "siren" as const, ...b })), ...pr.map((b) => ({ purpose: "programmable" as const, ...b }))]);

export function catalogArb(): fc.Arbitrary<Catalog> {
  return fc
    .record({
      nIt: int(1, 4),
      nPanels: int(1, 3),
      nBoards: int(0, 3),
      nKeypads: int(0, 3),
      nPsus: int(0, 2),
      nDetectors: int(0, 4),
      raw: fc.array(rawId, { minLength: 20, maxLength: 20 }),
      families: fc.uniqueArray(fc.stringMatching(/^[a-z][a-z0-9-]{1,12}$/), { minLength: 1, maxLength: 3 }),
      seed: fc.array(int(0, 1000), { minLength: 20, maxLength: 20 }),
    })
    .chain((s) => {
      const pick = <T>(xs: readonly T[], i: number) => xs[s.seed[i % s.seed.length] % xs.length];
      const itIds = Array.from({ length: s.nIt }, (_, i) => idFor("it", i, s.raw[i]));
      const block = (i: number, max = 64) => fc.record({ count: int(1, max), inputType: fc.constant(pick(itIds, i)) });
      const fams = (i: number) => fc.subarray(s.families, { minLength: 1 }).map((f) => (f.length ? f : [pick(s.families, i)]));
      const panel = (i: number): fc.Arbitrary<Panel> =>
        fc
          .record({
            ...priced,
            onboardInputs: block(i),
            extraZones: int(0, 300),
            addressMin: int(0, 10),
            span: int(0, 40),
            deviceShare: num(0, 1),
            maxCableM: num(1, 2000),
            auxOutputMa: ma(),
            sirenOutputMa: ma(),
            ownStandbyMa: ma(),
            ownAlarmMa: ma(),
            maxBatteryAh: num(0.5, 100),
            supplyVolts: num(6, 60),
            voltShare: num(0.1, 0.99),
            outputs: fc.option(outputBlocksArb(true).filter((b) => b.length > 0), { nil: undefined }),
            maxAreas: fc.option(int(1, 64), { nil: undefined }),
            zoneLabelLength: fc.option(int(4, 64), { nil: undefined }),
            zoneTypes: fc.option(fc.subarray(ZONE_TYPES, { minLength: 1 }), { nil: undefined }),
          })
          .map((r) => ({
            id: idFor("panel", i, s.raw[5 + i]),
            name: r.name,
            description: r.description,
            listPrice: r.listPrice,
            family: i < s.families.length ? s.families[i] : pick(s.families, i),
            onboardInputs: r.onboardInputs,
            maxZones: r.onboardInputs.count + r.extraZones,
            bus: { maxDevices: Math.floor((r.span + 1) * r.deviceShare), addressMin: r.addressMin, addressMax: r.addressMin + r.span, maxCableM: r.maxCableM },
            auxOutputMa: r.auxOutputMa,
            sirenOutputMa: r.sirenOutputMa,
            ownStandbyMa: r.ownStandbyMa,
            ownAlarmMa: r.ownAlarmMa,
            maxBatteryAh: r.maxBatteryAh,
            supplyVolts: r.supplyVolts,
            minDeviceVolts: r.supplyVolts * r.voltShare,
            ...(r.outputs ? { outputs: r.outputs } : {}),
            ...(r.maxAreas ? { maxAreas: r.maxAreas } : {}),
            ...(r.zoneLabelLength ? { zoneLabelLength: r.zoneLabelLength } : {}),
            ...(r.zoneTypes ? { zoneTypes: r.zoneTypes } : {}),
          }));
      // every family must belong to some panel: the first panels take the families in turn
      const nPanels = Math.max(s.nPanels, s.families.length);
      const board = (i: number): fc.Arbitrary<ExpansionBoard> =>
        fc
          .record({ ...priced, families: fams(i), inputs: block(i + 1, 16), standbyMa: ma(), alarmMa: ma(), takesBusAddress: fc.boolean(), ownSupply: fc.option(fc.record({ outputMa: ma(), maxBatteryAh: num(0.5, 100) }), { nil: undefined }) })
          .map(({ ownSupply, ...r }) => ({ id: idFor("board", i, s.raw[9 + i]), ...r, ...(ownSupply ? { ownSupply } : {}) }));
      const keypad = (i: number): fc.Arbitrary<Keypad> =>
        fc
          .record({ ...priced, families: fams(i + 2), inputs: fc.option(block(i + 2, 4), { nil: undefined }), standbyMa: ma(), alarmMa: ma(), takesBusAddress: fc.boolean() })
          .map(({ inputs, ...r }) => ({ id: idFor("keypad", i, s.raw[13 + i]), ...r, ...(inputs ? { inputs } : {}) }));
      const psu = (i: number): fc.Arbitrary<PowerSupply> =>
        fc
          .record({ ...priced, families: fams(i + 3), outputMa: ma(), maxBatteryAh: num(0.5, 100), standbyMa: ma(), alarmMa: ma(), takesBusAddress: fc.boolean(), outputVolts: num(1, 60) })
          .map((r) => ({ id: idFor("psu", i, s.raw[16 + i]), ...r }));
      const detector = (i: number): fc.Arbitrary<Detector> =>
        fc
          .record({
            ...priced,
            category: fc.constantFrom<Detector["category"]>("door-contact", "window-contact", "motion", "glass-break", "vibration", "panic", "water", "temperature", "smoke", "heat"),
            lifeSafety: fc.boolean(),
            contact: fc.constantFrom<Detector["contact"]>("NC", "NO"),
            tamper: fc.boolean(),
            power: fc.option(fc.record({ standbyMa: ma(), alarmMa: ma(), minVolts: num(1, 60) }), { nil: null }),
            mounting: textArb(200, 1),
          })
          .map((r) => ({ id: idFor("det", i, s.raw[18 + (i % 2)]), ...r, lifeSafety: r.category === "smoke" || r.category === "heat" ? true : r.lifeSafety }));
      const drawArb = { standbyMa: ma(), alarmMa: ma(), minVolts: num(1, 60) };
      const sounder = (i: number): fc.Arbitrary<Sounder> =>
        fc
          .record({ ...priced, placement: fc.constantFrom<Sounder["placement"]>("internal", "external"), ...drawArb, charging: fc.option(ma(), { nil: undefined }), mounting: textArb(200, 1) })
          .map(({ charging, ...r }) => ({ id: idFor("snd", i, s.raw[i]), ...r, ...(charging !== undefined && r.placement === "external" ? { ownBattery: { chargingMa: charging } } : {}) }));
      const strobe = (i: number): fc.Arbitrary<Strobe> => fc.record({ ...priced, ...drawArb, mounting: textArb(200, 1) }).map((r) => ({ id: idFor("stb", i, s.raw[2 + i]), ...r }));
      const outputModule = (i: number): fc.Arbitrary<OutputModule> =>
        fc.record({ ...priced, families: fams(i + 4), outputs: outputBlocksArb(false), standbyMa: ma(), alarmMa: ma(), takesBusAddress: fc.boolean() }).map((r) => ({ id: idFor("omod", i, s.raw[4 + i]), ...r }));
      const receiver = (i: number): fc.Arbitrary<WirelessReceiver> =>
        fc.record({ ...priced, families: fams(i + 5), maxDevices: int(1, 256), standbyMa: ma(), alarmMa: ma(), takesBusAddress: fc.boolean() }).map((r) => ({ id: idFor("rcv", i, s.raw[6 + i]), ...r }));
      const wirelessDetector = (i: number): fc.Arbitrary<WirelessDetector> =>
        fc
          .record({ ...priced, category: categories, lifeSafety: fc.boolean(), tamper: fc.boolean(), batteryYears: num(0.1, 20), mounting: textArb(200, 1) })
          .map((r) => ({ id: idFor("wdet", i, s.raw[8 + i]), ...r, lifeSafety: r.category === "smoke" || r.category === "heat" ? true : r.lifeSafety }));
      const many = <T>(n: number, f: (i: number) => fc.Arbitrary<T>) => fc.tuple(...Array.from({ length: n }, (_, i) => f(i)));
      return fc
        .record({
          inputTypes: fc.tuple(...itIds.map((id) => inputTypeArb(id))),
          panels: many(nPanels, panel),
          expansionBoards: many(s.nBoards, board),
          keypads: many(s.nKeypads, keypad),
          powerSupplies: many(s.nPsus, psu),
          detectors: many(s.nDetectors, detector),
          sounders: many(s.seed[0] % 3, sounder),
          strobes: many(s.seed[1] % 2, strobe),
          outputModules: many(s.seed[2] % 2, outputModule),
          wirelessReceivers: many(s.seed[3] % 2, receiver),
          wirelessDetectors: many(s.seed[4] % 3, wirelessDetector),
        })
        .map((c) => c as Catalog);
    });
}
