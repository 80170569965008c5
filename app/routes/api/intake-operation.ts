import { z } from "zod";
import type { Route } from "./+types/intake-operation";
import { commitIntake, discardIntake, rollbackIntake } from "#app/data/intakes.server.ts";
import { requireRole } from "#app/lib/auth.server.ts";

const ParamsSchema = z.object({ intakeId: z.uuid(), operation: z.enum(["commit", "discard", "rollback"]) });

const STATUS = { "not-found": 404, "wrong-state": 409, blocked: 409, stale: 409 } as const;

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireRole(request, "librarian");
  const parsed = ParamsSchema.safeParse(params);
  if (!parsed.success) {
    const message = ParamsSchema.shape.operation.safeParse(params.operation).success
      ? "No intake has that id."
      : `No operation "${params.operation}" on an intake: use commit, discard or rollback.`;
    return Response.json({ error: { code: "not-found", message, details: null } }, { status: 404 });
  }
  if (request.method !== "POST") {
    return Response.json({ error: { code: "method-not-allowed", message: "Use POST.", details: null } }, { status: 405 });
  }
  const { intakeId, operation } = parsed.data;
  const result =
    operation === "commit"
      ? await commitIntake(intakeId, user.id, { origin: new URL(request.url).origin })
      : operation === "discard"
        ? await discardIntake(intakeId, user.id)
        : await rollbackIntake(intakeId, user.id);
  if (!result.ok) return Response.json({ error: { code: result.code, message: result.message, details: null } }, { status: STATUS[result.code] });
  return Response.json(result.intake);
}
