import * as mariadb from "mariadb";
import type { RecorderResult, SaverResult } from "./workers";

// What the fault test checks afterwards, straight from the database nodes (each one, not through the proxy).

export const NODE_PORTS = [3331, 3332, 3333];
const DB = { user: "loopwright", password: process.env.LOOPWRIGHT_DB_PASSWORD ?? "loopwright-local", database: "loopwright" };

export async function onNode<T>(port: number, fn: (c: mariadb.Connection) => Promise<T>): Promise<T> {
  const c = await mariadb.createConnection({ host: "127.0.0.1", port, ...DB, connectTimeout: 3000 });
  try {
    // wait until this node has applied everything the cluster committed before the read
    await c.query("SET SESSION wsrep_sync_wait = 1");
    return await fn(c);
  } finally {
    await c.end();
  }
}

export interface SaveCheck {
  accepted: number;
  /** answered 502/503 or not at all, found stored afterwards: a save that succeeded but whose answer was lost */
  unknownStored: number;
  unknownNotStored: number;
  lost: string[];
  doubled: string[];
  strangers: string[];
  /** layouts whose revision count is not 1 + accepted + unknownStored */
  countMismatch: string[];
}

export async function checkSaves(port: number, savers: SaverResult[]): Promise<SaveCheck> {
  const out: SaveCheck = { accepted: 0, unknownStored: 0, unknownNotStored: 0, lost: [], doubled: [], strangers: [], countMismatch: [] };
  const byLayout = new Map<number, SaverResult[]>();
  for (const s of savers) byLayout.set(s.layoutId, [...(byLayout.get(s.layoutId) ?? []), s]);
  await onNode(port, async (c) => {
    for (const [layoutId, group] of byLayout) {
      const rows: { note: string; revision: number }[] = await c.query("SELECT note, revision FROM layout_revisions WHERE layout_id = ? ORDER BY revision", [layoutId]);
      const seen = new Map<string, number>();
      for (const r of rows.slice(1)) seen.set(r.note, (seen.get(r.note) ?? 0) + 1);
      const accepted = group.flatMap((s) => s.accepted);
      const unknown = group.flatMap((s) => s.unknown);
      for (const note of accepted) if (!seen.has(note)) out.lost.push(note);
      for (const [note, n] of seen) if (n > 1) out.doubled.push(`${note} ×${n}`);
      const known = new Set([...accepted, ...unknown]);
      for (const note of seen.keys()) if (!known.has(note)) out.strangers.push(note);
      const stored = unknown.filter((n) => seen.has(n)).length;
      out.accepted += accepted.length;
      out.unknownStored += stored;
      out.unknownNotStored += unknown.length - stored;
      if (rows.length !== 1 + accepted.length + stored) out.countMismatch.push(`layout ${layoutId}: ${rows.length} revisions, expected 1 + ${accepted.length} + ${stored}`);
    }
  });
  return out;
}

export interface ReadingCheck {
  accepted: number;
  lost: number;
  doubled: number;
  unresolved: number;
}

export async function checkReadings(port: number, layoutId: number, recorders: RecorderResult[]): Promise<ReadingCheck> {
  const accepted = recorders.flatMap((r) => r.accepted);
  return onNode(port, async (c) => {
    const rows: { client_id: string; n: bigint | number }[] = await c.query("SELECT client_id, COUNT(*) AS n FROM commissioning_readings WHERE layout_id = ? GROUP BY client_id", [layoutId]);
    const count = new Map(rows.map((r) => [r.client_id, Number(r.n)]));
    return {
      accepted: accepted.length,
      lost: accepted.filter((id) => !count.has(id)).length,
      doubled: rows.filter((r) => Number(r.n) > 1).length,
      unresolved: recorders.reduce((a, r) => a + r.unresolved.length, 0),
    };
  });
}

export interface NodeState {
  port: number;
  clusterSize: number;
  state: string;
  checksums: Record<string, string>;
}

export async function nodeState(port: number): Promise<NodeState> {
  return onNode(port, async (c) => {
    const status: { Variable_name: string; Value: string }[] = await c.query("SHOW GLOBAL STATUS WHERE Variable_name IN ('wsrep_cluster_size', 'wsrep_local_state_comment')");
    const v = Object.fromEntries(status.map((s) => [s.Variable_name, s.Value]));
    const tables: { name: string }[] = await c.query("SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() AND TABLE_TYPE = 'BASE TABLE' ORDER BY TABLE_NAME");
    const checksums: Record<string, string> = {};
    for (const t of tables) {
      const [row] = (await c.query(`CHECKSUM TABLE \`${t.name}\` EXTENDED`)) as { Checksum: bigint | number | null }[];
      checksums[t.name] = String(row.Checksum);
    }
    return { port, clusterSize: Number(v.wsrep_cluster_size), state: v.wsrep_local_state_comment, checksums };
  });
}

/** Tables whose checksum differs between the nodes. */
export function checksumDifferences(states: NodeState[]): string[] {
  const names = new Set(states.flatMap((s) => Object.keys(s.checksums)));
  return [...names].filter((t) => new Set(states.map((s) => s.checksums[t])).size !== 1);
}
