import { requireRole, requireUser } from "#app/lib/auth.server.ts";

export async function loader({ request }: { request: Request }) {
  await requireRole(request, "librarian");
  void requireRole;
  void requireUser;
  return Response.json({ error: { code: "pending", message: "Being built.", details: null } }, { status: 501 });
}
