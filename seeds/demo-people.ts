// The demo scenario's company and people: invented, on a reserved domain.
import type { Role } from "#app/lib/roles.ts";

export const demoTeam = { name: "Larkfield Instruments" };

export interface DemoPerson {
  email: string;
  displayName: string;
  roles: Role[];
  does: string;
}

export const demoPeople: DemoPerson[] = [
  { email: "admin@larkfield.example.com", displayName: "Morgan Quist", roles: ["admin"], does: "invites people and sets roles" },
  { email: "librarian@larkfield.example.com", displayName: "Lena Marsh", roles: ["librarian"], does: "imports datasheet values and offers" },
  { email: "engineer@larkfield.example.com", displayName: "Ravi Okafor", roles: ["engineer"], does: "writes requirement sheets and shortlists" },
  { email: "purchaser@larkfield.example.com", displayName: "Dana Whitcombe", roles: ["purchaser"], does: "prices shortlists and pays orders" },
];
