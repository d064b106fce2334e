// Permission → roles. Checked on the server in every page, route handler and server action.
// Role names appear nowhere else in the code.
export const roles = ["admin", "designer", "engineer", "installer"] as const;
export type Role = (typeof roles)[number];

const everyone: readonly Role[] = roles;

export const permissionTable = {
  "site:read": everyone,
  "site:write": ["admin", "designer", "engineer"],
  "site:archive": ["admin", "engineer"],
  "schedule:write": ["admin", "designer", "engineer"],
  "layout:read": everyone,
  "layout:write": ["admin", "designer", "engineer"],
  "layout:submit": ["admin", "designer", "engineer"],
  "layout:approve": ["engineer"],
  "layout:comment": everyone,
  "sheet:read": everyone,
  "sheet:send": ["admin", "engineer"],
  "commissioning:record": ["installer", "engineer"],
  "catalog:read": everyone,
  "catalog:upload": ["admin", "engineer"],
  "loop:analyze": everyone,
  "members:read": ["admin"],
  "members:manage": ["admin"],
  "audit:read": ["admin", "engineer"],
  "organisation:manage": ["admin"],
  "account:manage": everyone,
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissionTable;

export function can(role: Role | null | undefined, permission: Permission): boolean {
  return !!role && (permissionTable[permission] as readonly Role[]).includes(role);
}

export const roleLabels: Record<Role, string> = {
  admin: "Admin",
  designer: "Designer",
  engineer: "Engineer",
  installer: "Installer",
};

export const permissionLabels: Record<Permission, string> = {
  "site:read": "view sites",
  "site:write": "create and edit sites",
  "site:archive": "archive and restore sites",
  "schedule:write": "edit device schedules",
  "layout:read": "open layouts",
  "layout:write": "change layouts",
  "layout:submit": "send layouts for review",
  "layout:approve": "approve layouts",
  "layout:comment": "comment on layouts",
  "sheet:read": "open terminal sheets",
  "sheet:send": "send terminal sheets",
  "commissioning:record": "record commissioning readings",
  "catalog:read": "browse the catalog",
  "catalog:upload": "upload organisation catalogs",
  "loop:analyze": "use the loop bench",
  "members:read": "see the member list",
  "members:manage": "invite members and change roles",
  "audit:read": "read the audit log",
  "organisation:manage": "change the organisation's settings",
  "account:manage": "manage their own account",
};

/** A plain sentence for the UI and the API when a role lacks a permission. */
export function refusal(role: Role, permission: Permission): string {
  const allowed = (permissionTable[permission] as readonly Role[]).map((r) => roleLabels[r].toLowerCase());
  return `Your role (${roleLabels[role].toLowerCase()}) cannot ${permissionLabels[permission]}. Only ${allowed.join(" or ")} members can; ask an admin of your organisation if you need it.`;
}
