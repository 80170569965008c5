import { type RouteConfig, index, prefix, route } from "@react-router/dev/routes";

export default [
  index("routes/dashboard.tsx"),
  route("sign-in", "routes/auth/sign-in.tsx"),
  route("sign-in/verify", "routes/auth/verify.tsx"),
  route("sign-in/link", "routes/auth/magic-link.ts"),
  route("sign-out", "routes/auth/sign-out.ts"),
  route("design", "routes/design.tsx"),
  ...prefix("catalogue", [
    index("routes/catalogue/list.tsx"),
    route(":partId", "routes/catalogue/part.tsx"),
    route(":partId/edit", "routes/catalogue/edit.tsx"),
  ]),
  ...prefix("intakes", [
    index("routes/intakes/list.tsx"),
    route("new", "routes/intakes/new.tsx"),
    route("formats", "routes/intakes/formats.tsx"),
    route("templates/:kind", "routes/intakes/template.ts"),
    route(":intakeId", "routes/intakes/intake.tsx"),
    route(":intakeId/file", "routes/intakes/file.ts"),
    route(":intakeId/rejected", "routes/intakes/rejected.ts"),
  ]),
  ...prefix("people", [index("routes/people/list.tsx"), route(":personId", "routes/people/person.tsx")]),
  ...prefix("api", [
    route("health", "routes/api/health.ts"),
    route("parts", "routes/api/parts.ts"),
    route("parts/:partId", "routes/api/part.ts"),
    route("intakes", "routes/api/intakes.ts"),
    route("intakes/:intakeId", "routes/api/intake.ts"),
    route("intakes/:intakeId/:operation", "routes/api/intake-operation.ts"),
    route("*", "routes/api/not-found.ts"),
  ]),
  route("*", "routes/not-found.tsx"),
] satisfies RouteConfig;
