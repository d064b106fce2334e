import "server-only";
import type { Transaction } from "sequelize";
import type { Actor } from "./session";

// The session check's membership lookup, kept per process for a few seconds: most requests then cost a token
// check and a Map read instead of a three-table query. Anything that ends sessions or changes what an Actor holds
// forgets the entries it touches, in this process at once and after its transaction commits, and tells the other
// app processes of the same server (scripts/serve-every-core.mjs relays the message). Another machine's processes keep
// their copy until it expires: that is the window, LOOPWRIGHT_ACTOR_CACHE_MS (default 3,000 ms; 0 turns it off).

interface Entry {
  actor: Actor;
  sessionVersion: number;
  until: number;
}

interface CacheState {
  entries: Map<string, Entry>;
  /** Raised by every forget: a lookup that began before it must not store what it read. */
  generation: number;
  listening: boolean;
}

const KEY = Symbol.for("loopwright.actorCache");
const MESSAGE = "loopwright:forget-actor";
/** The build may give each route its own copy of this module; the cache is one per process. */
const holder = globalThis as typeof globalThis & { [KEY]?: CacheState };

function state(): CacheState {
  const s = (holder[KEY] ??= { entries: new Map(), generation: 0, listening: false });
  if (!s.listening && typeof process.send === "function") {
    s.listening = true;
    process.on("message", (msg: unknown) => {
      const m = msg as { type?: string; userId?: number; organisationId?: number } | null;
      if (m?.type === MESSAGE) forgetHere(m);
    });
  }
  return s;
}

export function actorCacheMs(): number {
  const raw = Number(process.env.LOOPWRIGHT_ACTOR_CACHE_MS ?? 3000);
  return Number.isFinite(raw) && raw >= 0 ? raw : 3000;
}

const keyOf = (userId: number, organisationId: number) => `${userId}:${organisationId}`;

/** The cached Actor for this user, organisation and session version, or undefined when none is fresh. */
export function cachedActor(userId: number, organisationId: number, sessionVersion: number, now = Date.now()): Actor | undefined {
  const e = state().entries.get(keyOf(userId, organisationId));
  if (!e || e.until <= now || e.sessionVersion !== sessionVersion) return undefined;
  return e.actor;
}

/** Call before the lookup; pass the result to `rememberActor`, which stores nothing if a forget came in between. */
export function lookupTicket(): number {
  return state().generation;
}

export function rememberActor(ticket: number, actor: Actor, sessionVersion: number, now = Date.now()): void {
  const s = state();
  const ms = actorCacheMs();
  if (ms === 0 || ticket !== s.generation) return;
  // bounded: an entry per signed-in member is small, but a flood of distinct tokens must not grow it without end
  if (s.entries.size >= 10_000) s.entries.clear();
  s.entries.set(keyOf(actor.userId, actor.organisationId), { actor, sessionVersion, until: now + ms });
}

function forgetHere(what: { userId?: number; organisationId?: number }): void {
  const s = state();
  s.generation++;
  for (const [k, e] of s.entries) if (e.actor.userId === what.userId || e.actor.organisationId === what.organisationId) s.entries.delete(k);
}

function forget(what: { userId?: number; organisationId?: number }, transaction?: Transaction): void {
  const everywhere = () => {
    forgetHere(what);
    if (typeof process.send === "function") process.send({ type: MESSAGE, ...what });
  };
  everywhere();
  // a lookup in another request between now and the commit still reads the old rows: forget again after it
  transaction?.afterCommit(everywhere);
}

/** Sign-out, new password, role change: every cached session check of this member. */
export const forgetMember = (userId: number, transaction?: Transaction) => forget({ userId }, transaction);

/** Organisation settings changed: every cached session check of its members. */
export const forgetOrganisation = (organisationId: number, transaction?: Transaction) => forget({ organisationId }, transaction);

/** For tests: how many entries this process holds. */
export const actorCacheSize = () => state().entries.size;
