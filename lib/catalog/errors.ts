/** A path into a catalog document, e.g. `["panels", 0, "bus", "maxCableM"]`. */
export type CatalogPath = readonly (string | number)[];

/** One refusal: where (1-based line and column in the named file), which field, and why. */
export interface CatalogError {
  file: string;
  line: number;
  column: number;
  /** Dotted field path, e.g. `panels.0.bus.maxCableM`; empty for the whole file. */
  path: string;
  message: string;
}

export function formatPath(path: CatalogPath): string {
  return path.map(String).join(".");
}

/** `family-compact.yaml:12:5 panels.0.bus.maxCableM: message` */
export function formatCatalogError(e: CatalogError): string {
  return `${e.file}:${e.line}:${e.column}${e.path ? ` ${e.path}` : ""}: ${e.message}`;
}

export function sortErrors(errors: CatalogError[]): CatalogError[] {
  return [...errors].sort((a, b) => a.file.localeCompare(b.file) || a.line - b.line || a.column - b.column);
}
