import { data, Link, redirect } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/edit";
import { PartForm } from "#app/components/catalogue/part-form.tsx";
import { partToFormValues, readPartForm, type PartFormValues } from "#app/components/catalogue/part-form-fields.ts";
import { getPart, updatePart } from "#app/data/parts.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";
import { readFormData } from "#app/lib/forms.ts";

const ParamsSchema = z.object({ partId: z.uuid() });

async function loadPart(params: Route.LoaderArgs["params"]) {
  const parsed = ParamsSchema.safeParse(params);
  const detail = parsed.success ? await getPart(parsed.data.partId) : null;
  if (!detail) throw new Response("No part in the catalogue has that address.", { status: 404 });
  return detail.part;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  const part = await loadPart(params);
  return { part: { id: part.id, manufacturer: part.manufacturer, partNumber: part.partNumber }, values: partToFormValues(part) };
}

export async function action({ request, params }: Route.ActionArgs) {
  const librarian = await requireRole(request, "librarian");
  const part = await loadPart(params);
  const formData = await readFormData(request);
  if (!formData) {
    return data({ fieldErrors: { form: "The request had no form data. Send the form again." }, values: partToFormValues(part) as PartFormValues }, { status: 400 });
  }
  const form = readPartForm(formData);
  if (!form.ok) return data({ fieldErrors: form.fieldErrors, values: form.values }, { status: 400 });
  const saved = await updatePart(part.id, form.spec, { id: librarian.id });
  if (!saved.ok) return data({ fieldErrors: { form: saved.message }, values: form.values }, { status: 400 });
  return redirect(`/catalogue/${part.id}?saved=1`);
}

export const meta: Route.MetaFunction = ({ data }) => [{ title: `Correct ${data?.part.partNumber ?? "part"} · Betasift` }];

export default function EditPart({ loaderData, actionData }: Route.ComponentProps) {
  const { part } = loaderData;
  const values = actionData?.values ?? loaderData.values;
  return (
    <section className="max-w-5xl space-y-4">
      <p className="text-sm">
        <Link to="/catalogue" className="text-signal underline">Catalogue</Link>
        {" / "}
        <Link to={`/catalogue/${part.id}`} className="text-signal underline">
          {part.partNumber}
        </Link>
      </p>
      <div>
        <h1 className="text-2xl font-semibold">
          Correct {part.partNumber} <span className="font-normal text-ink/60">· {part.manufacturer}</span>
        </h1>
        <p className="mt-1 text-ink/70">
          Type values with their units (<code>45 V</code>, <code>100 mA</code>, <code>250 MHz</code>, <code>10 µA</code> or <code>10uA</code>); the same rules as an
          intake file apply. Fields marked * are required.
        </p>
      </div>
      <PartForm key={JSON.stringify(values)} values={values} errors={actionData?.fieldErrors ?? {}} cancelHref={`/catalogue/${part.id}`} />
    </section>
  );
}
