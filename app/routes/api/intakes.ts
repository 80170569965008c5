import { z } from "zod";
import type { Route } from "./+types/intakes";
import { getIntake, listIntakes, previewIntake } from "#app/data/intakes.server.ts";
import { MAX_INTAKE_BYTES } from "#app/domain/intake/columns.ts";
import { apiError, apiHandler, methodNotAllowed } from "#app/lib/api.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";
import { toFieldErrors } from "#app/lib/forms.ts";
import { readMultipartUpload, tooLargeMessage } from "#app/lib/upload.server.ts";

const UploadSchema = z.object({
  kind: z.enum(["parts", "offers"], { error: "kind must be parts or offers" }),
  file: z.instanceof(File, { error: "file is required: attach the CSV file" }),
});

const PageSchema = z.object({ page: z.coerce.number({ error: "page must be a whole number" }).int({ error: "page must be a whole number" }).min(1, { error: "page must be at least 1" }).default(1) });

export const loader = apiHandler(async ({ request }: Route.LoaderArgs) => {
  await requireRole(request, "librarian");
  const query = PageSchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return apiError(400, "invalid-query", "The intakes list takes page (1, 2, ...).", toFieldErrors(query.error));
  return Response.json(await listIntakes(query.data.page));
});

const refuseMethod = methodNotAllowed(["GET", "POST"]);

export const action = apiHandler(async ({ request }: Route.ActionArgs) => {
  if (request.method !== "POST") return refuseMethod({ request });
  const user = await requireRole(request, "librarian");
  const upload = await readMultipartUpload(request, MAX_INTAKE_BYTES);
  if (!upload.ok) return apiError(upload.status, upload.code, upload.message, { maxBytes: MAX_INTAKE_BYTES });
  const parsed = UploadSchema.safeParse({ kind: upload.form.get("kind") ?? undefined, file: upload.form.get("file") ?? undefined });
  if (!parsed.success) return apiError(400, "invalid", "The upload needs the fields kind (parts or offers) and file.", toFieldErrors(parsed.error));
  const { kind, file } = parsed.data;
  if (file.size > MAX_INTAKE_BYTES) return apiError(413, "too-large", tooLargeMessage(MAX_INTAKE_BYTES), { maxBytes: MAX_INTAKE_BYTES });
  const intake = await previewIntake({
    kind,
    fileName: file.name.trim().slice(0, 255) || `${kind}.csv`,
    bytes: new Uint8Array(await file.arrayBuffer()),
    uploadedBy: user.id,
  });
  return Response.json(await getIntake(intake.id), { status: 201 });
});
