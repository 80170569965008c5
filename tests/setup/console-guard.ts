// An unexpected console.error fails the test that caused it.
import { afterEach, beforeEach, vi } from "vitest";

let calls: unknown[][] = [];

beforeEach(() => {
  calls = [];
  vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => {
    calls.push(args);
  });
});

afterEach(() => {
  vi.mocked(console.error).mockRestore();
  if (calls.length > 0) {
    const first = calls[0]!.map((a) => (a instanceof Error ? a.stack : String(a))).join(" ");
    throw new Error(`console.error was called ${calls.length} time(s); first: ${first}`);
  }
});
