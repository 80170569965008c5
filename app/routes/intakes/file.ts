import { z } from "zod";
import type { Route } from "./+types/file";
import { getIntakeFile } from "#app/data/intakes.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ intakeId: z.uuid() });

/** A header value for the original name: a plain ASCII fallback plus the exact name in RFC 5987 form. */
function contentDisposition(fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  const parsed = ParamsSchema.safeParse(params);
  const file = parsed.success ? await getIntakeFile(parsed.data.intakeId) : null;
  if (!file) throw new Response("No intake has that id.", { status: 404 });
  return new Response(file.bytes, {
    headers: {
      // The bytes go back exactly as uploaded, whatever their encoding; no charset is claimed.
      "Content-Type": "text/csv",
      "Content-Disposition": contentDisposition(file.fileName),
      "Content-Length": String(file.bytes.byteLength),
      "Cache-Control": "no-store",
    },
  });
}
