import { data, Link, redirect, useNavigate } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/new";
import { IntakeUpload } from "#app/components/intake/intake-upload.tsx";
import { formatBytes } from "#app/components/ui/format.ts";
import { previewIntake } from "#app/data/intakes.server.ts";
import { MAX_INTAKE_BYTES } from "#app/domain/intake/columns.ts";
import { requireRole } from "#app/lib/auth.server.ts";
import { readMultipartUpload } from "#app/lib/upload.server.ts";

const UploadSchema = z.object({
  kind: z.enum(["parts", "offers"], { error: "Choose whether the file holds parts or offers." }),
  // A form sent with no file chosen still carries an empty, nameless file part.
  file: z.instanceof(File, { error: "Choose a CSV file first." }).refine((file) => file.name !== "" || file.size > 0, { error: "Choose a CSV file first." }),
});

const tooLarge = () =>
  data({ error: `The file is larger than the ${formatBytes(MAX_INTAKE_BYTES)} an intake accepts. Split it into smaller files and upload each.` }, { status: 413 });

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  return { maxBytes: MAX_INTAKE_BYTES };
}

// The form's own target when the page runs without JavaScript; with it, the page posts to /api/intakes.
export async function action({ request }: Route.ActionArgs) {
  const user = await requireRole(request, "librarian");
  const upload = await readMultipartUpload(request, MAX_INTAKE_BYTES);
  if (!upload.ok) return data({ error: upload.message }, { status: upload.status });
  const parsed = UploadSchema.safeParse({ kind: upload.form.get("kind") ?? undefined, file: upload.form.get("file") ?? undefined });
  if (!parsed.success) return data({ error: parsed.error.issues[0]?.message ?? "Choose a CSV file first." }, { status: 400 });
  const { kind, file } = parsed.data;
  if (file.size > MAX_INTAKE_BYTES) return tooLarge();
  const intake = await previewIntake({ kind, fileName: file.name, bytes: new Uint8Array(await file.arrayBuffer()), uploadedBy: user.id });
  return redirect(`/intakes/${intake.id}`);
}

export const meta: Route.MetaFunction = () => [{ title: "New intake · Betasift" }];

export default function NewIntake({ loaderData, actionData }: Route.ComponentProps) {
  const navigate = useNavigate();
  return (
    <section className="max-w-3xl">
      <p className="text-sm">
        <Link to="/intakes" className="text-signal underline">Intakes</Link>
      </p>
      <h1 className="mt-2 text-2xl font-semibold">New intake</h1>
      <p className="mt-1 text-ink/70">
        Upload a CSV file of datasheet values (parts) or of supplier stock and prices (offers). Betasift reads every cell, shows what is wrong with row and column, and what would
        change, before anything is written.
      </p>
      <div className="mt-6 rounded border border-rule bg-white p-5">
        <IntakeUpload maxBytes={loaderData.maxBytes} serverError={actionData?.error ?? null} onUploaded={(id) => navigate(`/intakes/${id}`)} />
      </div>
      <div className="mt-6 grid gap-3 text-sm sm:grid-cols-3">
        <a href="/intakes/templates/parts" className="rounded border border-rule bg-white px-4 py-3 hover:border-signal">
          <span className="block font-medium text-signal">Parts template</span>
          <span className="text-ink/70">CSV header and one example row</span>
        </a>
        <a href="/intakes/templates/offers" className="rounded border border-rule bg-white px-4 py-3 hover:border-signal">
          <span className="block font-medium text-signal">Offers template</span>
          <span className="text-ink/70">CSV header and one example row</span>
        </a>
        <Link to="/intakes/formats" className="rounded border border-rule bg-white px-4 py-3 hover:border-signal">
          <span className="block font-medium text-signal">File formats</span>
          <span className="text-ink/70">every column, its unit, required or not</span>
        </Link>
      </div>
    </section>
  );
}
