import { keyAtPath, type EditTree } from "./structure-edit";

// Issues (from zod in the browser or a 422 from the server) placed beside their field: a detail field by name, a
// floor, area or room by its editor key; the rest in one line. Pure.

export interface PlacedErrors {
  fields: Record<string, string>;
  nodes: Record<string, string>;
  other: string[];
}

export function placeIssues(issues: readonly { path: string | readonly PropertyKey[]; message: string }[], tree: EditTree): PlacedErrors {
  const out: PlacedErrors = { fields: {}, nodes: {}, other: [] };
  for (const i of issues) {
    const parts = typeof i.path === "string" ? i.path.split(".") : i.path.map(String);
    if (parts[0] === "floors" && parts.length > 1) {
      const key = keyAtPath(tree, parts.slice(1));
      if (key) {
        out.nodes[key] ??= i.message;
        continue;
      }
    }
    if (parts.length === 1 && parts[0] && parts[0] !== "(body)" && parts[0] !== "floors") out.fields[parts[0]] ??= i.message;
    else out.other.push(i.message);
  }
  return out;
}
