// The label a person knows a field by, for a path into a request or a loop description: "cable.lengthM" →
// "cable length", "detectors.1.contact" → "detector 2's contact". Messages name fields by these, never by the path.

/** Keyed by the path with list positions as "#" (counted from 1 in the label). */
const LABELS: Record<string, string> = {
  loop: "loop",
  inputType: "input type",
  detectors: "detectors",
  "detectors.#": "detector #",
  "detectors.#.label": "detector #'s name",
  "detectors.#.contact": "detector #'s contact",
  "detectors.#.tamper": "detector #'s tamper contact",
  "detectors.#.lifeSafety": "detector #'s life-safety setting",
  cable: "cable",
  "cable.lengthM": "cable length",
  "cable.gauge": "cable gauge",
  "cable.gauge.awg": "cable gauge (AWG)",
  "cable.gauge.mm2": "conductor cross-section",
  "cable.tempMinC": "lowest cable temperature",
  "cable.tempMaxC": "highest cable temperature",
  tolerancePct: "part tolerance",
  contactOhms: "contact resistance",
  shortOhms: "short resistance",
  eolOhms: "end-of-line resistor",
  alarmOhms: "alarm resistor",
  sharedOhms: "shared input resistors",
  "sharedOhms.#": "resistor of detector #",
  scheme: "wiring scheme",
  placement: "resistor placement",
  pathway: "pathway",
  cores: "cable cores",
  conductorFaults: "conductor faults",
  "conductorFaults.#": "conductor fault #",
  "conductorFaults.#.atM": "position of conductor fault #",
  "conductorFaults.#.cores": "cores of conductor fault #",
  awg: "cable gauge (AWG)",
  mm2: "conductor cross-section",
  gauge: "cable gauge",
  label: "name",
  reading: "reading",
  name: "name",
  email: "e-mail",
  password: "password",
  role: "role",
  catalogId: "detector type",
  cableM: "cable length",
  area: "area",
  room: "room",
  supervision: "supervision",
  address: "address",
  description: "description",
  reason: "reason",
  body: "comment",
  note: "note",
  installerUserId: "installer",
  rows: "rows",
  "rows.#": "row #",
};

/** The field's label, or null when the path names no field a person would know. A leading "loop." is dropped. */
export function fieldLabel(path: string | readonly (string | number)[]): string | null {
  const parts = (typeof path === "string" ? path.split(".") : path.map(String)).filter((p) => p !== "");
  if (parts[0] === "loop" && parts.length > 1) parts.shift();
  if (parts.length === 0) return null;
  const numbers = parts.filter((p) => /^\d+$/.test(p)).map((p) => Number(p) + 1);
  const key = parts.map((p) => (/^\d+$/.test(p) ? "#" : p)).join(".");
  const label = LABELS[key];
  if (!label) return null;
  let k = 0;
  return label.replace(/#/g, () => String(numbers[k++]));
}

/** "Cable length: cable length can't be negative" when the field is known, the message alone otherwise. */
export function withFieldLabel(path: string | readonly (string | number)[], message: string): string {
  const label = fieldLabel(path);
  if (!label) return message;
  const head = label.charAt(0).toUpperCase() + label.slice(1);
  return message.toLowerCase().startsWith(label.toLowerCase()) ? message : `${head}: ${message}`;
}
