import { renderToString } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { listColumnDocs } from "#app/domain/intake/columns.ts";
import { FormatTable } from "./format-docs.tsx";

describe("FormatTable", () => {
  it("documents every column of both formats with its unit, whether it is required and an example", () => {
    for (const kind of ["parts", "offers"] as const) {
      const columns = listColumnDocs(kind);
      const html = renderToString(<FormatTable kind={kind} columns={columns} />);
      expect((html.match(/<tbody>.*<\/tbody>/s)?.[0].match(/<tr /g) ?? []).length).toBe(columns.length);
      for (const column of columns) {
        expect(html).toContain(`>${column.name}<`);
        expect(html).toContain(column.example.replace(/&/g, "&amp;"));
      }
    }
    const parts = renderToString(<FormatTable kind="parts" columns={listColumnDocs("parts")} />);
    expect(parts).toMatch(/>vceo<\/td><td[^>]*><span[^>]*>VCEO<\/span>.*?<\/td><td[^>]*>voltage<\/td><td[^>]*>V<\/td><td[^>]*><span[^>]*>yes<\/span>/s);
    expect(parts).toContain(">gainN_ic<");
  });
});
