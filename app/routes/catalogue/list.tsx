import { requireRole, requireUser } from "#app/lib/auth.server.ts";

export async function loader({ request }: { request: Request }) {
  await requireUser(request);
  void requireRole;
  void requireUser;
  return null;
}

export default function Pending() {
  return <p>Being built.</p>;
}
