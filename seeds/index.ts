// Every demo seed, in order, loaded through umzug with its own meta table.
import * as demoTeamAndPeople from "./0001-demo-team-and-people.ts";
import * as demoCatalogue from "./0002-demo-catalogue.ts";

export const seeds = [
  { name: "0001-demo-team-and-people", ...demoTeamAndPeople },
  { name: "0002-demo-catalogue", ...demoCatalogue },
];
