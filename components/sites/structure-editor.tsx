"use client";

import { addArea, addFloor, addRoomTo, moveNode, removeNode, renameNode, type EditTree } from "@/lib/sites/structure-edit";
import { StructureNode } from "@/components/sites/structure-node";

const addButton = "mt-2 rounded border border-dashed border-signal px-2 py-1 text-xs font-medium text-signal hover:bg-signal-soft";

/** The site's floors, each with its areas and rooms, in order. Controlled: the parent keeps the tree and saves it. */
export function StructureEditor({ tree, onChange, errors }: { tree: EditTree; onChange: (tree: EditTree) => void; errors: Record<string, string> }) {
  const node = (key: string) => ({
    error: errors[key],
    onRename: (name: string) => onChange(renameNode(tree, key, name)),
    onMove: (by: -1 | 1) => onChange(moveNode(tree, key, by)),
    onRemove: () => onChange(removeNode(tree, key)),
  });
  return (
    <div className="flex flex-col gap-3" data-testid="structure-editor">
      {tree.length === 0 ? <p className="text-sm text-slate-600">No floors yet. A detector&apos;s area and room are chosen from this structure.</p> : null}
      {tree.map((f, fi) => (
        <StructureNode key={f.key} kind="floor" name={f.name} testId={`floor-name-${fi}`} first={fi === 0} last={fi === tree.length - 1} {...node(f.key)}>
          {f.areas.map((a, ai) => (
            <StructureNode key={a.key} kind="area" name={a.name} testId={`area-name-${fi}-${ai}`} first={ai === 0} last={ai === f.areas.length - 1} {...node(a.key)}>
              {a.rooms.map((r, ri) => (
                <StructureNode key={r.key} kind="room" name={r.name} testId={`room-name-${fi}-${ai}-${ri}`} first={ri === 0} last={ri === a.rooms.length - 1} {...node(r.key)} />
              ))}
              <button type="button" className={`${addButton} ml-4`} onClick={() => onChange(addRoomTo(tree, a.key, `Room ${a.rooms.length + 1}`))} data-testid={`add-room-${fi}-${ai}`}>
                + Add room
              </button>
            </StructureNode>
          ))}
          <button type="button" className={`${addButton} ml-4`} onClick={() => onChange(addArea(tree, f.key, `Area ${tree.reduce((n, x) => n + x.areas.length, 0) + 1}`))} data-testid={`add-area-${fi}`}>
            + Add area
          </button>
        </StructureNode>
      ))}
      <div>
        <button type="button" className={addButton} onClick={() => onChange(addFloor(tree, `Floor ${tree.length + 1}`))} data-testid="add-floor">
          + Add floor
        </button>
      </div>
    </div>
  );
}
