import { renderToString } from "react-dom/server";
import { createRoutesStub } from "react-router";
import { describe, expect, it } from "vitest";
import { demoParts } from "#seeds/data/parts.ts";
import { PartForm } from "./part-form.tsx";
import { PART_FIELDS, partToFormValues } from "./part-form-fields.ts";

function render(element: React.ReactElement): string {
  const Stub = createRoutesStub([{ path: "/catalogue/:id/edit", Component: () => element }]);
  return renderToString(<Stub initialEntries={["/catalogue/x/edit"]} />);
}

describe("PartForm", () => {
  const part = demoParts[0]!;
  const values = partToFormValues(part);

  it("has an input for every field and one row per gain and saturation point", () => {
    const html = render(<PartForm values={values} errors={{}} cancelHref="/catalogue/x" />);
    for (const spec of PART_FIELDS) expect(html).toContain(`name="${spec.field}"`);
    expect((html.match(/name="gainPoints\.icAmps"/g) ?? []).length).toBe(part.gainPoints.length);
    expect((html.match(/name="saturationPoints\.icAmps"/g) ?? []).length).toBe(part.saturationPoints.length);
    expect(html).toContain(`value="${values.fields.vceoVolts}"`);
    expect(html).toContain(">fT<");
    expect(html).toContain("+ Add gain point");
  });

  it("marks each refused field and says nothing was saved", () => {
    const html = render(<PartForm values={values} errors={{ icMaxAmps: "a voltage (V) where a current is expected", "gainPoints.0.hfeMin": "hFE min (450) is above hFE max (200)" }} cancelHref="/catalogue/x" />);
    expect(html).toContain("2 values need fixing; nothing was saved.");
    expect(html).toMatch(/id="field-icMaxAmps-error"[^>]*>a voltage \(V\) where a current is expected</);
    expect(html).toContain("hFE min (450) is above hFE max (200)");
  });
});
