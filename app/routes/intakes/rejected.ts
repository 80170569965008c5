import { z } from "zod";
import type { Route } from "./+types/rejected";
import { getRejectedRows } from "#app/data/intake-rejected.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ intakeId: z.uuid() });

/** A header value for the name: a plain ASCII fallback plus the exact name in RFC 5987 form. */
function contentDisposition(fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  const parsed = ParamsSchema.safeParse(params);
  if (!parsed.success) throw new Response("No intake has that id.", { status: 404 });
  const file = await getRejectedRows(parsed.data.intakeId);
  if (!file.ok) throw new Response(file.message, { status: file.status });
  return new Response(file.csv, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": contentDisposition(file.fileName),
      "Cache-Control": "no-store",
    },
  });
}
