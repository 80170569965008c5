import { renderToString } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { intakeIdOf, IntakeUpload, uploadErrorMessage } from "./intake-upload.tsx";

const MAX = 20 * 1024 * 1024;

describe("IntakeUpload before JavaScript runs", () => {
  it("is a plain multipart form with a visible file input and the kind choice", () => {
    const html = renderToString(<IntakeUpload maxBytes={MAX} onUploaded={() => {}} />);
    const form = /<form[^>]*>/.exec(html)?.[0] ?? "";
    expect(form).toContain('method="post"');
    expect(form).toContain('encType="multipart/form-data"');
    expect(html).toMatch(/<input type="file"[^>]*name="file"/);
    expect(html).toContain('<input type="radio" name="kind" checked="" value="parts"/>');
    expect(html).toContain('<input type="radio" name="kind" value="offers"/>');
    expect(html).toContain("Drop a CSV file here, or click to choose one");
    expect(html).toContain("UTF-8; up to 20.0 MB.");
  });

  it("shows a message the page's own action returned", () => {
    const html = renderToString(<IntakeUpload maxBytes={MAX} serverError="Choose a CSV file first." onUploaded={() => {}} />);
    expect(html).toMatch(/role="alert"[^>]*>Choose a CSV file first\.</);
  });
});

describe("uploadErrorMessage", () => {
  it("explains a 413 with the limit, preferring the server's own words", () => {
    expect(uploadErrorMessage(413, null, MAX)).toBe("The file is larger than the 20.0 MB limit. Split it into smaller files and upload each.");
    expect(uploadErrorMessage(413, { error: { code: "too-large", message: "Over 20 MB." } }, MAX)).toBe("Over 20 MB.");
  });

  it("passes on the API's message for other refusals and names lost sessions and connections", () => {
    expect(uploadErrorMessage(400, { error: { code: "bad-request", message: "Choose parts or offers." } }, MAX)).toBe("Choose parts or offers.");
    expect(uploadErrorMessage(401, null, MAX)).toContain("Sign in again");
    expect(uploadErrorMessage(0, null, MAX)).toContain("did not reach the server");
    expect(uploadErrorMessage(502, "gateway", MAX)).toContain("The server answered 502");
  });
});

describe("intakeIdOf", () => {
  it("reads the new intake's id from the preview answer", () => {
    expect(intakeIdOf({ id: "a1" })).toBe("a1");
    expect(intakeIdOf({ intake: { id: "b2" } })).toBe("b2");
    expect(intakeIdOf({ error: { message: "no" } })).toBeNull();
    expect(intakeIdOf(null)).toBeNull();
  });
});
