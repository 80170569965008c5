// The React Router plugin's server build, imported by the HTTP app that Vite bundles with it.
declare module "virtual:react-router/server-build" {
  import type { ServerBuild } from "react-router";
  const build: ServerBuild;
  export = build;
}
