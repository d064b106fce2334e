// The caution printed on every sheet and report that carries smoke, heat or other life-safety devices.
export const SHEET_LIFE_SAFETY_CAUTION =
  "Life-safety devices: the design must follow the local fire code and the authority having jurisdiction, and be installed and certified by licensed people. Loopwright's figures are an aid, not an approval.";
