import { renderToString } from "react-dom/server";
import { createRoutesStub } from "react-router";
import { describe, expect, it } from "vitest";
import { arrangeProblems, ChangeList, CountsInline, IntakeCountsBar, ProblemsTable } from "./intake-parts.tsx";
import type { ShownProblem } from "./types.ts";

function render(element: React.ReactElement): string {
  const Stub = createRoutesStub([{ path: "/intakes/:id", Component: () => element }]);
  return renderToString(<Stub initialEntries={["/intakes/abc"]} />);
}

// The problems fixtures/demo/parts-messy.csv gives (see tests/reference/demo-data.test.ts), trimmed.
const PROBLEMS: ShownProblem[] = [
  { row: 1, column: "colour", value: "Colour", message: 'unknown column "colour" is ignored', severity: "warning" },
  { row: 6, column: "gain2_hfe_min", value: "430", message: "gain point 2: hFE min (430) is above hFE max (235)", severity: "error" },
  { row: 8, column: "ic_max", value: "48 V", message: "a voltage (V) where a current is expected", severity: "error" },
  { row: 11, column: "part_number", value: null, message: "part number is required", severity: "error" },
];

describe("ProblemsTable", () => {
  it("shows each problem with row, column, value, message and severity", () => {
    const html = render(<ProblemsTable problems={PROBLEMS} />);
    expect(html).toContain('data-testid="problems-table"');
    expect(html).toMatch(/<tr[^>]*data-severity="error"[^>]*><td[^>]*>8<\/td><td[^>]*>ic_max<\/td><td[^>]*>48 V<\/td><td[^>]*>a voltage \(V\) where a current is expected<\/td>/);
    expect(html).toContain(">empty<");
    expect(html).toContain("All 4");
    expect(html).toContain("Errors 3");
    expect(html).toContain("Warnings 1");
  });

  it("filters by severity and links each filter and sort in the URL", () => {
    const html = render(<ProblemsTable problems={PROBLEMS} filter="warning" />);
    expect((html.match(/data-severity=/g) ?? []).length).toBe(1);
    expect(html).toContain('href="/intakes/abc?severity=error#problems"');
    expect(html).toContain('href="/intakes/abc?severity=warning&amp;sort=severity#problems"');
  });

  it("says so when a file has no problem", () => {
    expect(render(<ProblemsTable problems={[]} />)).toContain("No problems");
  });
});

describe("arrangeProblems", () => {
  it("sorts by severity with errors first, keeping file order among equals", () => {
    expect(arrangeProblems(PROBLEMS, "all", "severity").map((p) => p.row)).toEqual([6, 8, 11, 1]);
    expect(arrangeProblems(PROBLEMS, "all", "column").map((p) => p.column)).toEqual(["colour", "gain2_hfe_min", "ic_max", "part_number"]);
    expect(arrangeProblems(PROBLEMS, "error", "row").map((p) => p.row)).toEqual([6, 8, 11]);
  });
});

describe("ChangeList", () => {
  it("shows each change before → after with units, and lists the new parts", () => {
    const html = render(
      <ChangeList
        kind="parts"
        changes={[
          {
            row: 2,
            status: "changed",
            manufacturer: "Ostrevik Semiconductor",
            partNumber: "OSK2750N",
            fields: [
              { field: "vceoVolts", before: 36, after: 40 },
              { field: "icMaxAmps", before: 0.35, after: 0.5 },
              { field: "lifecycle", before: "active", after: "nrnd" },
            ],
          },
          { row: 3, status: "new", manufacturer: "Maelbrook Devices", partNumber: "MLB468T", fields: [] },
          { row: 4, status: "unchanged", manufacturer: "Maelbrook Devices", partNumber: "MLB568T", fields: [] },
        ]}
      />,
    );
    expect(html).toMatch(/VCEO<\/td><td[^>]*>36 V<\/td><td[^>]*>→<\/td><td[^>]*>40 V<\/td>/);
    expect(html).toMatch(/IC max<\/td><td[^>]*>350 mA<\/td><td[^>]*>→<\/td><td[^>]*>500 mA<\/td>/);
    expect(html).toContain("not recommended for new designs");
    expect(html).toContain("MLB468T");
    expect(html).toContain("1 part in the file matches the catalogue exactly and stays as it is.");
  });
});

describe("IntakeCountsBar", () => {
  it("shows the five counts", () => {
    const html = renderToString(<IntakeCountsBar counts={{ new: 12, changed: 1, unchanged: 0, rejected: 4, warnings: 2 }} />);
    for (const [key, value] of [["new", 12], ["changed", 1], ["unchanged", 0], ["rejected", 4], ["warnings", 2]] as const) {
      expect(html).toMatch(new RegExp(`data-count="${key}"><dt[^>]*>${key}</dt><dd[^>]*>${value}</dd>`));
    }
  });
});

describe("CountsInline", () => {
  it("leaves zero counts out of the intake list", () => {
    const html = renderToString(<CountsInline counts={{ new: 89, changed: 0, unchanged: 0, rejected: 4, warnings: 0 }} />);
    expect(html).toContain(">89 new<");
    expect(html).toContain("4 rejected");
    expect(html).not.toContain("changed");
    expect(renderToString(<CountsInline counts={{ new: 0, changed: 0, unchanged: 0, rejected: 0, warnings: 0 }} />)).toContain("no rows");
  });
});
