// Every migration, in order. Listed statically so that tsx, Vitest and the app build all load them the same way.
import * as teamsUsersRoles from "./0001-teams-users-roles.ts";
import * as signInFailures from "./0002-sign-in-failures.ts";
import * as catalogueAndIntakes from "./0003-catalogue-and-intakes.ts";
import * as identityKeys from "./0010-identity-keys.ts";
import * as intakeReadings from "./0011-intake-readings.ts";

export const migrations = [
  { name: "0001-teams-users-roles", ...teamsUsersRoles },
  { name: "0002-sign-in-failures", ...signInFailures },
  { name: "0003-catalogue-and-intakes", ...catalogueAndIntakes },
  { name: "0010-identity-keys", ...identityKeys },
  { name: "0011-intake-readings", ...intakeReadings },
];
