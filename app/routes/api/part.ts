import { z } from "zod";
import type { Route } from "./+types/part";
import { getPart } from "#app/data/parts.server.ts";
import { apiError, apiHandler, methodNotAllowed } from "#app/lib/api.server.ts";
import { requireUser } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ partId: z.uuid() });

export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  await requireUser(request);
  const parsed = ParamsSchema.safeParse(params);
  const part = parsed.success ? await getPart(parsed.data.partId) : null;
  if (!part) return apiError(404, "not-found", "No part in the catalogue has that id.");
  return Response.json(part);
});

export const action = methodNotAllowed(["GET"]);
