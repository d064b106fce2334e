import "server-only";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { authOptions } from "./auth-options";
import { bindModels } from "./db";
import { Membership, Organisation, User } from "@/models";
import { can, refusal, type Permission, type Role } from "@/lib/auth/permissions";
import { ApiError } from "./errors";
import { cachedActor, lookupTicket, rememberActor } from "./actor-cache";
import type { OrganisationSettings } from "@/lib/organisation/settings-schema";

export interface Actor {
  userId: number;
  organisationId: number;
  organisationName: string;
  role: Role;
  name: string;
  email: string;
  /** The organisation's settings: money, dates, paper, units, whether one person may submit and approve. */
  settings: OrganisationSettings;
}

export const ORGANISATION_SETTING_ATTRIBUTES = ["name", "currency", "locale", "timeZone", "paper", "units", "soloApproval"] as const;

export function settingsOf(org: Organisation): OrganisationSettings {
  return { currency: org.currency, locale: org.locale, timeZone: org.timeZone, paper: org.paper, units: org.units, soloApproval: !!org.soloApproval };
}

/**
 * The signed-in member. The token only names the user and organisation and carries the session version from
 * sign-in; the membership, role, settings and current session version come from the database, kept per process
 * for a few seconds (lib/server/actor-cache.ts) and forgotten at once on sign-out, a new password, a role change
 * or a settings change. A token signed in before the version was raised is refused.
 */
export async function currentActor(): Promise<Actor | null> {
  const session = (await getServerSession(authOptions())) as { userId?: number; organisationId?: number; sessionVersion?: number } | null;
  if (!session?.userId || !session.organisationId || typeof session.sessionVersion !== "number") return null;
  const cached = cachedActor(session.userId, session.organisationId, session.sessionVersion);
  if (cached) return cached;
  const ticket = lookupTicket();
  bindModels();
  const membership = await Membership.findOne({
    where: { userId: session.userId, organisationId: session.organisationId },
    include: [{ model: User, attributes: ["name", "email", "sessionVersion"] }, { model: Organisation, attributes: [...ORGANISATION_SETTING_ATTRIBUTES] }],
  });
  if (!membership) return null;
  const m = membership as Membership & { User: User; Organisation: Organisation };
  if (m.User.sessionVersion !== session.sessionVersion) return null;
  const actor: Actor = { userId: m.userId, organisationId: m.organisationId, organisationName: m.Organisation.name, role: m.role, name: m.User.name, email: m.User.email, settings: settingsOf(m.Organisation) };
  rememberActor(ticket, actor, m.User.sessionVersion);
  return actor;
}

/** For API handlers and actions: 401 when signed out, 403 when the role lacks the permission. */
export async function requireActor(permission: Permission): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) throw new ApiError(401, "Sign in to continue.");
  if (!can(actor.role, permission)) throw new ApiError(403, refusal(actor.role, permission));
  return actor;
}

/** For pages: the sign-in page when signed out; the caller renders the refusal when `allowed` is false. */
export async function pageActor(permission: Permission, returnTo: string): Promise<{ actor: Actor; allowed: boolean; reason: string }> {
  const actor = await currentActor();
  if (!actor) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  const allowed = can(actor.role, permission);
  return { actor, allowed, reason: allowed ? "" : refusal(actor.role, permission) };
}
