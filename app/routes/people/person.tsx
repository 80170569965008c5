import { data, Form } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/person";
import { Button, Notice } from "#app/components/ui/field.tsx";
import { RoleCheckboxes } from "#app/components/role-checkboxes.tsx";
import { countOtherActiveAdmins, findPersonById, setActive, setRoles } from "#app/data/users.server.ts";
import { countSessionsOf } from "#app/data/sessions.server.ts";
import { requireRole, signOutEverywhere } from "#app/lib/auth.server.ts";
import { formError, manyOf, parseForm } from "#app/lib/forms.ts";
import { ROLES } from "#app/lib/roles.ts";

const ParamsSchema = z.object({ personId: z.uuid() });

const PersonFormSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("roles"), roles: manyOf(z.enum(ROLES, { error: "Unknown role." })) }),
  z.object({ intent: z.literal("deactivate") }),
  z.object({ intent: z.literal("reactivate") }),
  z.object({ intent: z.literal("sign-out-everywhere") }),
]);

async function loadPerson(params: Route.LoaderArgs["params"]) {
  const parsed = ParamsSchema.safeParse(params);
  const person = parsed.success ? await findPersonById(parsed.data.personId) : null;
  if (!person) throw new Response("No person has that address in Betasift.", { status: 404 });
  return person;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const admin = await requireRole(request, "admin");
  const person = await loadPerson(params);
  return { person, isSelf: admin.id === params.personId, openSessions: await countSessionsOf(person.id) };
}

export async function action({ request, params }: Route.ActionArgs) {
  const admin = await requireRole(request, "admin");
  const person = await loadPerson(params);
  const form = await parseForm(request, PersonFormSchema);
  if (!form.ok) return data({ fieldErrors: form.fieldErrors, notice: null }, { status: 400 });
  const losesAdmin =
    person.roles.includes("admin") &&
    ((form.data.intent === "roles" && !form.data.roles.includes("admin")) || form.data.intent === "deactivate");
  if (losesAdmin && (await countOtherActiveAdmins(person.id)) === 0) {
    return data({ fieldErrors: formError("Betasift needs at least one active admin: make someone else admin first."), notice: null }, { status: 400 });
  }
  if (form.data.intent === "deactivate" && person.id === admin.id) {
    return data({ fieldErrors: formError("You cannot deactivate yourself."), notice: null }, { status: 400 });
  }
  switch (form.data.intent) {
    case "roles":
      await setRoles(person.id, form.data.roles);
      return { fieldErrors: null, notice: "Roles saved." };
    case "deactivate":
      await setActive(person.id, false);
      return { fieldErrors: null, notice: `${person.displayName} is deactivated and signed out everywhere.` };
    case "reactivate":
      await setActive(person.id, true);
      return { fieldErrors: null, notice: `${person.displayName} can sign in again.` };
    case "sign-out-everywhere": {
      const ended = await signOutEverywhere(person.id);
      const sessions = ended === 1 ? "1 session" : `${ended} sessions`;
      return { fieldErrors: null, notice: `${person.displayName} is signed out everywhere (${sessions} ended).` };
    }
  }
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `${data?.person.displayName ?? "Person"} · Betasift` }];

export default function PersonPage({ loaderData, actionData }: Route.ComponentProps) {
  const { person } = loaderData;
  const errors = actionData?.fieldErrors ?? undefined;
  return (
    <section className="max-w-xl">
      <p className="text-sm">
        <a href="/people" className="text-signal underline">
          People
        </a>
      </p>
      <h1 className="mt-2 text-2xl font-semibold">{person.displayName}</h1>
      <p className="mt-1 text-ink/70">
        {person.email} · {person.active ? "active" : "deactivated"}
      </p>
      <div className="mt-4 space-y-2">
        {actionData?.notice ? <Notice tone="info">{actionData.notice}</Notice> : null}
        {errors?.form ? <Notice tone="fault">{errors.form}</Notice> : null}
      </div>
      <Form method="post" className="mt-6 space-y-4">
        <input type="hidden" name="intent" value="roles" />
        <RoleCheckboxes key={person.roles.join()} selected={person.roles} error={errors?.roles} />
        <Button type="submit">Save roles</Button>
      </Form>
      <Form method="post" className="mt-10 border-t border-rule pt-6">
        <input type="hidden" name="intent" value="sign-out-everywhere" />
        <p className="text-sm text-ink/80">
          {loaderData.openSessions === 0
            ? "No open sessions."
            : `${loaderData.openSessions === 1 ? "1 open session" : `${loaderData.openSessions} open sessions`}. Ending them signs ${loaderData.isSelf ? "you" : "this person"} out on every device at once${loaderData.isSelf ? ", this one included" : ""}.`}
        </p>
        <button type="submit" disabled={loaderData.openSessions === 0} className="mt-3 rounded border border-rule px-4 py-2 hover:bg-paper disabled:opacity-60">
          Sign out everywhere
        </button>
      </Form>
      <Form method="post" className="mt-10 border-t border-rule pt-6">
        {person.active ? (
          <>
            <input type="hidden" name="intent" value="deactivate" />
            <p className="text-sm text-ink/80">A deactivated person cannot sign in, and their open sessions end at once.</p>
            <button type="submit" className="mt-3 rounded border border-fault px-4 py-2 text-fault hover:bg-fault-soft">
              Deactivate
            </button>
          </>
        ) : (
          <>
            <input type="hidden" name="intent" value="reactivate" />
            <button type="submit" className="rounded border border-rule px-4 py-2 hover:bg-paper">
              Reactivate
            </button>
          </>
        )}
      </Form>
    </section>
  );
}
