// Roles are shared by server guards and the client's navigation (which only hides what a role cannot use).
export const ROLES = ["admin", "librarian", "engineer", "purchaser"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Admin",
  librarian: "Librarian",
  engineer: "Engineer",
  purchaser: "Purchaser",
};

export function isRole(value: string): value is Role {
  return (ROLES as readonly string[]).includes(value);
}

/** Admins may do everything a role can. */
export function hasRole(userRoles: readonly Role[], wanted: readonly Role[]): boolean {
  return userRoles.includes("admin") || wanted.some((role) => userRoles.includes(role));
}
