import { z } from "zod";
import type { Route } from "./+types/intake";
import { getIntake } from "#app/data/intakes.server.ts";
import { apiError, apiHandler, methodNotAllowed } from "#app/lib/api.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ intakeId: z.uuid() });

export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  await requireRole(request, "librarian");
  const parsed = ParamsSchema.safeParse(params);
  const intake = parsed.success ? await getIntake(parsed.data.intakeId) : null;
  if (!intake) return apiError(404, "not-found", "No intake has that id.");
  return Response.json(intake);
});

export const action = methodNotAllowed(["GET"]);
