import { data, Form, Link } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/list";
import { Button, Notice, TextField } from "#app/components/ui/field.tsx";
import { RoleCheckboxes } from "#app/components/role-checkboxes.tsx";
import { PageTitle } from "#app/components/ui/page-title.tsx";
import { TableFrame } from "#app/components/ui/table-frame.tsx";
import { EmailTakenError, invitePerson, listPeople } from "#app/data/users.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";
import { EmailSchema, manyOf, parseForm, type FieldErrors } from "#app/lib/forms.ts";
import { ROLE_LABELS, ROLES } from "#app/lib/roles.ts";

const InviteSchema = z.object({
  intent: z.literal("invite"),
  email: EmailSchema,
  displayName: z.string().trim().min(1, "Type the person's name.").max(120, "Keep the name under 120 characters."),
  roles: manyOf(z.enum(ROLES, { error: "Unknown role." })).pipe(z.array(z.enum(ROLES)).min(1, "Choose at least one role.")),
});

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, "admin");
  return { people: await listPeople() };
}

export async function action({ request }: Route.ActionArgs) {
  const admin = await requireRole(request, "admin");
  const form = await parseForm(request, InviteSchema);
  if (!form.ok) return data({ fieldErrors: form.fieldErrors, values: form.values, invited: null }, { status: 400 });
  try {
    const person = await invitePerson({ ...form.data, teamOf: admin.id });
    return { fieldErrors: null, values: {} as Record<string, string>, invited: person.email };
  } catch (error) {
    if (error instanceof EmailTakenError) {
      const fieldErrors: FieldErrors = { email: error.message };
      return data({ fieldErrors, values: form.values, invited: null }, { status: 400 });
    }
    throw error;
  }
}

export const meta: Route.MetaFunction = () => [{ title: "People · Betasift" }];

export default function People({ loaderData, actionData }: Route.ComponentProps) {
  const errors = actionData?.fieldErrors ?? undefined;
  return (
    <section>
      <PageTitle title="People" lead="Everyone who can sign in, and what their roles let them do." />
      <div className="mt-6">
        <TableFrame label="People">
          <table className="w-full min-w-[640px] border-collapse bg-white text-sm">
            <thead>
              <tr className="border-b border-rule text-left">
                <th className="px-3 py-2 font-medium">Name</th>
                <th className="px-3 py-2 font-medium">E-mail</th>
                <th className="px-3 py-2 font-medium">Roles</th>
                <th className="px-3 py-2 font-medium">State</th>
                <th className="px-3 py-2 font-medium">Last sign-in</th>
              </tr>
            </thead>
            <tbody>
              {loaderData.people.map((person) => (
                <tr key={person.id} className="border-b border-rule/60">
                  <td className="px-3 py-2">
                    <Link to={`/people/${person.id}`} className="text-signal underline">
                      {person.displayName}
                    </Link>
                  </td>
                  <td className="px-3 py-2">{person.email}</td>
                  <td className="px-3 py-2">{person.roles.map((r) => ROLE_LABELS[r]).join(", ") || "none"}</td>
                  <td className="px-3 py-2">{person.active ? "active" : "deactivated"}</td>
                  <td className="px-3 py-2">
                    {person.lastSignInAt ? new Date(person.lastSignInAt).toISOString().slice(0, 16).replace("T", " ") : "never"}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </TableFrame>
      </div>

      <h2 className="mt-10 text-lg font-semibold">Invite someone</h2>
      <p className="mt-1 text-sm text-ink/70">They sign in with a code e-mailed to this address; no password is ever set.</p>
      {actionData?.invited ? (
        <div className="mt-4">
          <Notice tone="info">{`${actionData.invited} can sign in now.`}</Notice>
        </div>
      ) : null}
      {/* A new form after each invitation, so the fields start empty again. */}
      <Form key={actionData?.invited ?? "invite"} method="post" className="mt-4 grid max-w-xl gap-4" noValidate>
        <input type="hidden" name="intent" value="invite" />
        {errors?.form ? <Notice tone="fault">{errors.form}</Notice> : null}
        <TextField label="Name" name="displayName" defaultValue={actionData?.values.displayName ?? ""} error={errors?.displayName} />
        <TextField label="E-mail address" name="email" type="email" defaultValue={actionData?.values.email ?? ""} error={errors?.email} />
        <RoleCheckboxes selected={actionData?.values.roles?.split(",") ?? []} error={errors?.roles} />
        <div>
          <Button type="submit">Invite</Button>
        </div>
      </Form>
    </section>
  );
}
