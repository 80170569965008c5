import { z } from "zod";
import type { Route } from "./+types/intake";
import { getIntake } from "#app/data/intakes.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ intakeId: z.uuid() });

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireRole(request, "librarian");
  const parsed = ParamsSchema.safeParse(params);
  const intake = parsed.success ? await getIntake(parsed.data.intakeId) : null;
  if (!intake) return Response.json({ error: { code: "not-found", message: "No intake has that id.", details: null } }, { status: 404 });
  return Response.json(intake);
}
