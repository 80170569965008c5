// Prints how long each Vitest project took (from its first test file's start to its last one's end, and the
// time its files spent running), then the whole run. Projects run side by side, so spans overlap.
import type { Reporter, TestModule } from "vitest/node";

interface ProjectSpan {
  startMs: number;
  endMs: number;
  busyMs: number;
  files: number;
  tests: number;
  failed: number;
}

const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

export default class DurationReporter implements Reporter {
  private runStartMs = Date.now();
  private readonly spans = new Map<string, ProjectSpan>();

  onTestRunStart(): void {
    this.runStartMs = Date.now();
  }

  private spanOf(module: TestModule): ProjectSpan {
    const name = module.project.name || "default";
    let span = this.spans.get(name);
    if (!span) {
      span = { startMs: Date.now(), endMs: Date.now(), busyMs: 0, files: 0, tests: 0, failed: 0 };
      this.spans.set(name, span);
    }
    return span;
  }

  onTestModuleStart(module: TestModule): void {
    const span = this.spanOf(module);
    span.startMs = Math.min(span.startMs, Date.now());
  }

  onTestModuleEnd(module: TestModule): void {
    const span = this.spanOf(module);
    const diagnostic = module.diagnostic();
    span.endMs = Math.max(span.endMs, Date.now());
    span.busyMs += diagnostic.collectDuration + diagnostic.setupDuration + diagnostic.duration;
    span.files += 1;
    for (const test of module.children.allTests()) {
      span.tests += 1;
      if (test.result().state === "failed") span.failed += 1;
    }
  }

  onTestRunEnd(): void {
    const lines = [...this.spans.entries()]
      .sort(([, a], [, b]) => a.startMs - b.startMs)
      .map(
        ([name, span]) =>
          `  ${name.padEnd(12)} ${seconds(span.endMs - span.startMs).padStart(8)} from first file to last, ${seconds(span.busyMs)} in its files; ` +
          `${span.files} files, ${span.tests} tests, ${span.failed} failed`,
      );
    process.stdout.write(`\nbetasift test: durations by project\n${lines.join("\n")}\n  ${"all".padEnd(12)} ${seconds(Date.now() - this.runStartMs).padStart(8)} for the whole Vitest run\n`);
  }
}
