// The one shape of a person read from SQL, shared by the people queries and the per-request session lookup.
import { isRole, type Role } from "#app/lib/roles.ts";

export interface Person {
  id: string;
  email: string;
  displayName: string;
  active: boolean;
  roles: Role[];
  teamName: string | null;
  lastSignInAt: string | null;
}

export interface PersonSql {
  id: string;
  email: string;
  display_name: string;
  active: boolean;
  roles: string[];
  team_name: string | null;
  last_sign_in_at: Date | null;
}

/** Columns over `users u LEFT JOIN teams t`; no model instances, since this runs on every signed-in request. */
export const PERSON_COLUMNS = `u.id, u.email, u.display_name, u.active, u.last_sign_in_at, t.name AS team_name,
  ARRAY(SELECT r.role FROM user_roles r WHERE r.user_id = u.id) AS roles`;

export function sqlToPerson(row: PersonSql): Person {
  return {
    id: row.id,
    email: row.email,
    displayName: row.display_name,
    active: row.active,
    roles: row.roles.filter(isRole).sort(),
    teamName: row.team_name,
    lastSignInAt: row.last_sign_in_at ? new Date(row.last_sign_in_at).toISOString() : null,
  };
}
