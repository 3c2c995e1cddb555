// Who may do what. One table, read by pages, route handlers, server actions
// and the role-matrix test, so a permission is never decided inline.
export const ROLES = ["admin", "designer", "reviewer", "manager", "viewer"] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = {
  read: ["admin", "designer", "reviewer", "manager", "viewer"],
  "members:manage": ["admin"],
  "workspace:settings": ["admin"],
  "project:write": ["admin", "designer"],
  "part:write": ["admin", "designer"],
  "option:write": ["admin", "designer"],
  "option:submit": ["admin", "designer"],
  "option:review": ["admin", "reviewer"],
  "derating:write": ["admin", "reviewer"],
  "option:choose": ["admin", "manager"],
  "bench:write": ["admin", "designer", "reviewer"],
  // Background jobs (sweeps, Monte Carlo, reports) cost server time: every role that writes something may start one, a viewer may not.
  "job:start": ["admin", "designer", "reviewer", "manager"],
  "token:own": ["admin", "designer", "reviewer", "manager", "viewer"],
  // Each member sees only their own mail there (services/mail/dev-inbox.ts).
  "dev:inbox": ["admin", "designer", "reviewer", "manager", "viewer"],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
