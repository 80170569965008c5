import { z } from "zod";
import type { Route } from "./+types/intake-operation";
import { commitIntake, discardIntake, rollbackIntake } from "#app/data/intakes.server.ts";
import { apiError, apiHandler, methodNotAllowed } from "#app/lib/api.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ intakeId: z.uuid(), operation: z.enum(["commit", "discard", "rollback"]) });

const STATUS = { "not-found": 404, "wrong-state": 409, blocked: 409, stale: 409 } as const;

export const loader = methodNotAllowed(["POST"]);

export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  if (request.method !== "POST") return methodNotAllowed(["POST"])({ request });
  const user = await requireRole(request, "librarian");
  const parsed = ParamsSchema.safeParse(params);
  if (!parsed.success) {
    const message = ParamsSchema.shape.operation.safeParse(params.operation).success
      ? "No intake has that id."
      : `No operation "${params.operation}" on an intake: use commit, discard or rollback.`;
    return apiError(404, "not-found", message);
  }
  const { intakeId, operation } = parsed.data;
  const result =
    operation === "commit"
      ? await commitIntake(intakeId, user.id)
      : operation === "discard"
        ? await discardIntake(intakeId, user.id)
        : await rollbackIntake(intakeId, user.id);
  if (!result.ok) return apiError(STATUS[result.code], result.code, result.message);
  return Response.json(result.intake);
});
