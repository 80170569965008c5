import type { Route } from "./+types/parts";
import { listParts } from "#app/data/parts.server.ts";
import { apiError, apiHandler, methodNotAllowed } from "#app/lib/api.server.ts";
import { requireUser } from "#app/lib/auth.server.ts";
import { parsePartListQuery } from "#app/lib/catalogue-query.ts";

export const loader = apiHandler(async ({ request }: Route.LoaderArgs) => {
  await requireUser(request);
  const parsed = parsePartListQuery(new URL(request.url).searchParams);
  if (!parsed.ok) {
    return apiError(400, "invalid-query", "Some filters are not valid.", parsed.fieldErrors);
  }
  return Response.json({ query: parsed.query, ...(await listParts(parsed.query)) });
});

export const action = methodNotAllowed(["GET"]);
