// Types for the untyped `resistor-data` package, used only as a second opinion in tests.
declare module "resistor-data" {
  export function notationToBands(data: [string, number], bands?: number): string[];
  export function bandsToNotation(bands: string[]): [string, number];
  export function valueToNotation(value: number): string;
  export function notationToValue(notation: string): number;
}
