import { type RouteConfig, index, prefix, route } from "@react-router/dev/routes";

export default [
  index("routes/dashboard.tsx"),
  route("sign-in", "routes/auth/sign-in.tsx"),
  route("sign-in/verify", "routes/auth/verify.tsx"),
  route("sign-in/link", "routes/auth/magic-link.ts"),
  route("sign-out", "routes/auth/sign-out.ts"),
  ...prefix("people", [index("routes/people/list.tsx"), route(":personId", "routes/people/person.tsx")]),
  ...prefix("api", [route("health", "routes/api/health.ts"), route("*", "routes/api/not-found.ts")]),
  route("*", "routes/not-found.tsx"),
] satisfies RouteConfig;
