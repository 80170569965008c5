import type { TestProject } from "vitest/node";
import { startTestApp } from "./global-app.ts";

export default function setup(project: TestProject) {
  return startTestApp(project, "betasift_test_e2e");
}
