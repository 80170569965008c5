import { Op, QueryTypes } from "sequelize";
import { db } from "#app/lib/db.server.ts";
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

type UserRow = InstanceType<ReturnType<typeof db>["User"]>;

function toPerson(user: UserRow & { team?: { name: string } | null }): Person {
  const roles = (user.roles ?? []).map((r) => r.role).filter(isRole);
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    active: user.active,
    roles: [...roles].sort(),
    teamName: user.team?.name ?? null,
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
  };
}

const withRolesAndTeam = () => [
  { model: db().UserRole, as: "roles" },
  { model: db().Team, as: "team" },
];

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

interface PersonSql {
  id: string;
  email: string;
  display_name: string;
  active: boolean;
  roles: string[];
  team_name: string | null;
  last_sign_in_at: Date | null;
}

// One statement and no model instances: this runs on every signed-in request (the person is never cached).
const PERSON_SELECT = `SELECT u.id, u.email, u.display_name, u.active, u.last_sign_in_at, t.name AS team_name,
  ARRAY(SELECT r.role FROM user_roles r WHERE r.user_id = u.id) AS roles
  FROM users u LEFT JOIN teams t ON t.id = u.team_id`;

function sqlToPerson(row: PersonSql): Person {
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

// An escaped replacement, not a bind parameter: one simple-protocol message instead of five socket writes per request.
async function selectPerson(where: string, value: string): Promise<Person | null> {
  const [row] = await db().sequelize.query<PersonSql>(`${PERSON_SELECT} WHERE ${where} = :value`, { replacements: { value }, type: QueryTypes.SELECT, raw: true });
  return row ? sqlToPerson(row) : null;
}

export async function findPersonByEmail(email: string): Promise<Person | null> {
  return selectPerson("u.email", normaliseEmail(email));
}

export async function findPersonById(id: string): Promise<Person | null> {
  return selectPerson("u.id", id);
}

export async function listPeople(): Promise<Person[]> {
  const users = await db().User.findAll({ include: withRolesAndTeam(), order: [["displayName", "ASC"]] });
  return users.map(toPerson);
}

export async function recordSignIn(id: string): Promise<void> {
  await db().User.update({ lastSignInAt: new Date() }, { where: { id } });
}

export class EmailTakenError extends Error {}

/** Invites a person: they can sign in with an e-mailed code from now on. Joins the inviter's team. */
export async function invitePerson(input: { email: string; displayName: string; roles: Role[]; teamOf: string }): Promise<Person> {
  const { sequelize, User, UserRole } = db();
  const email = normaliseEmail(input.email);
  const id = await sequelize.transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email }, transaction });
    if (existing) throw new EmailTakenError(`${email} already has an account`);
    const inviter = await User.findByPk(input.teamOf, { transaction });
    const user = await User.create(
      { email, displayName: input.displayName.trim(), teamId: inviter?.teamId ?? null, deactivatedAt: null, lastSignInAt: null },
      { transaction },
    );
    await UserRole.bulkCreate(input.roles.map((role) => ({ userId: user.id, role })), { transaction });
    return user.id;
  });
  return (await findPersonById(id))!;
}

export async function setRoles(id: string, roles: Role[]): Promise<void> {
  const { sequelize, UserRole } = db();
  await sequelize.transaction(async (transaction) => {
    await UserRole.destroy({ where: { userId: id, role: { [Op.notIn]: roles } }, transaction });
    for (const role of roles) await UserRole.findOrCreate({ where: { userId: id, role }, transaction });
  });
}

export async function setActive(id: string, active: boolean): Promise<void> {
  await db().User.update({ active, deactivatedAt: active ? null : new Date() }, { where: { id } });
}

/** How many active admins remain besides this person: the last one may not lose the role. */
export async function countOtherActiveAdmins(id: string): Promise<number> {
  const { User, UserRole } = db();
  return UserRole.count({
    where: { role: "admin", userId: { [Op.ne]: id } },
    include: [{ model: User, where: { active: true }, required: true }],
  });
}
