// Every migration, in order. Listed statically so that tsx, Vitest and the app build all load them the same way.
import * as teamsUsersRoles from "./0001-teams-users-roles.ts";
import * as signInFailures from "./0002-sign-in-failures.ts";
import * as catalogueAndIntakes from "./0003-catalogue-and-intakes.ts";
import * as serverSessions from "./0004-server-sessions-and-challenges.ts";
import * as identityKeys from "./0005-identity-keys.ts";
import * as intakeReadings from "./0006-intake-readings.ts";

export const migrations = [
  { name: "0001-teams-users-roles", ...teamsUsersRoles },
  { name: "0002-sign-in-failures", ...signInFailures },
  { name: "0003-catalogue-and-intakes", ...catalogueAndIntakes },
  { name: "0004-server-sessions-and-challenges", ...serverSessions },
  { name: "0005-identity-keys", ...identityKeys },
  { name: "0006-intake-readings", ...intakeReadings },
];
