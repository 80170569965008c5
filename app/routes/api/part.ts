import { z } from "zod";
import type { Route } from "./+types/part";
import { getPart } from "#app/data/parts.server.ts";
import { requireUser } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ partId: z.uuid() });

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const parsed = ParamsSchema.safeParse(params);
  const part = parsed.success ? await getPart(parsed.data.partId) : null;
  if (!part) return Response.json({ error: { code: "not-found", message: "No part in the catalogue has that id.", details: null } }, { status: 404 });
  return Response.json(part);
}
