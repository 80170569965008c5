import { Op, QueryTypes } from "sequelize";
import { db } from "#app/lib/db.server.ts";
import { isRole, type Role } from "#app/lib/roles.ts";
import { PERSON_COLUMNS, sqlToPerson, type Person, type PersonSql } from "./person-row.server.ts";

export type { Person };

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

// An escaped replacement, not a bind parameter: one simple-protocol message instead of five socket writes per request.
async function selectPerson(where: string, value: string): Promise<Person | null> {
  const [row] = await db().sequelize.query<PersonSql>(`SELECT ${PERSON_COLUMNS} FROM users u LEFT JOIN teams t ON t.id = u.team_id WHERE ${where} = :value`, { replacements: { value }, type: QueryTypes.SELECT, raw: true });
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

/** Deactivation ends the person's sessions in the same transaction, so reactivation revives none of them. */
export async function setActive(id: string, active: boolean): Promise<void> {
  const { sequelize, User } = db();
  await sequelize.transaction(async (transaction) => {
    await User.update({ active, deactivatedAt: active ? null : new Date() }, { where: { id }, transaction });
    if (!active) await sequelize.query(`DELETE FROM sessions WHERE user_id = :id`, { replacements: { id }, transaction });
  });
}

/** How many active admins remain besides this person: the last one may not lose the role. */
export async function countOtherActiveAdmins(id: string): Promise<number> {
  const { User, UserRole } = db();
  return UserRole.count({
    where: { role: "admin", userId: { [Op.ne]: id } },
    include: [{ model: User, where: { active: true }, required: true }],
  });
}
