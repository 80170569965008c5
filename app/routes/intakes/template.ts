import { z } from "zod";
import type { Route } from "./+types/template";
import { templateCsv } from "#app/domain/intake/columns.ts";
import { requireRole } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ kind: z.enum(["parts", "offers"]) });

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  const parsed = ParamsSchema.safeParse(params);
  if (!parsed.success) throw new Response("There are templates for parts and for offers only.", { status: 404 });
  const { kind } = parsed.data;
  return new Response(templateCsv(kind), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="betasift-${kind}-template.csv"`,
      "Cache-Control": "no-store",
    },
  });
}
