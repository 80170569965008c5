// The librarian's journey in a real browser: drop a messy CSV, read the problems, commit,
// then find a committed part in the catalogue and see its hFE plot.
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, expect, inject, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { artifactPath, launchBrowser } from "../setup/browser.ts";
import { loginAs } from "../setup/browser-login.ts";

const MESSY_FILE = path.resolve(import.meta.dirname, "../../fixtures/demo/parts-messy.csv");
const LIBRARIAN = "librarian@larkfield.example.com";

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const GOOD_FILE = path.resolve(import.meta.dirname, "../../fixtures/intake/good/parts-three-gain-points.csv");

async function signIn(page: Page, email: string): Promise<void> {
  await loginAs(page, email);
  await page.goto(`${inject("appUrl")}/`);
}

it("a librarian drops a messy parts file, reads its problems, commits it, finds a new part with its plot, and is refused a rollback a later intake blocks", async () => {
  const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
  const pageErrors: string[] = [];
  page.on("pageerror", (error) => pageErrors.push(error.message));
  page.on("console", (message) => {
    // The refused rollback answers 409 on purpose; the browser logs that answer.
    if (message.type() === "error" && !message.text().includes("status of 409")) pageErrors.push(message.text());
  });

  await signIn(page, LIBRARIAN);

  // The drop zone's own input exists once the page has hydrated.
  await page.goto(`${inject("appUrl")}/intakes/new`);
  const input = page.getByTestId("drop-zone-input");
  await input.waitFor({ state: "attached" });
  await page.screenshot({ path: artifactPath("intake-new.png"), fullPage: true, caret: "initial" });
  await input.setInputFiles(MESSY_FILE);
  await expect.poll(() => page.getByTestId("chosen-file").textContent()).toContain("parts-messy.csv");
  await page.screenshot({ path: artifactPath("intake-chosen.png"), fullPage: true, caret: "initial" });

  // Record every value the progress bar shows, so the test needs no timing.
  await page.evaluate(() => {
    const seen: string[] = [];
    (window as unknown as { progressSeen: string[] }).progressSeen = seen;
    new MutationObserver(() => {
      const bar = document.querySelector('[data-testid="upload-progress"]');
      if (bar) seen.push(`${bar.getAttribute("data-phase")}:${bar.getAttribute("aria-valuenow")}`);
    }).observe(document.body, { subtree: true, childList: true, attributes: true });
  });
  await page.getByRole("button", { name: "Upload and preview" }).click();
  await page.waitForURL(/\/intakes\/[0-9a-f-]{36}$/);
  const progress = await page.evaluate(() => (window as unknown as { progressSeen: string[] }).progressSeen);
  expect(progress.at(-1)).toMatch(/^(checking|done):100$/);

  // The preview: counts, and the problems table with a known bad cell at its row and column.
  await expect.poll(() => page.textContent("h1")).toBe("parts-messy.csv");
  const problems = page.getByTestId("problems-table");
  const icMaxRow = problems.locator("tbody tr", { hasText: "ic_max" });
  await expect.poll(() => icMaxRow.locator("td").allTextContents()).toEqual(["8", "ic_max", "48 V", "a voltage (V) where a current is expected", "error"]);
  const partNumberRow = problems.locator("tbody tr", { hasText: "part_number" });
  await expect.poll(() => partNumberRow.locator("td").first().textContent()).toBe("11");
  expect(await page.locator('[data-count="rejected"] dd').textContent()).toBe("4");
  expect(Number(await page.locator('[data-count="new"] dd').textContent())).toBeGreaterThanOrEqual(12);
  await page.screenshot({ path: artifactPath("intake-preview.png"), fullPage: true, caret: "initial" });

  await page.getByRole("button", { name: /^Commit \d+ parts$/ }).click();
  await expect.poll(() => page.getByRole("status").first().textContent()).toContain("Committed");
  await expect.poll(() => page.locator("[data-state]").first().getAttribute("data-state")).toBe("committed");
  await page.screenshot({ path: artifactPath("intake-committed.png"), fullPage: true, caret: "initial" });
  const intakeUrl = page.url();

  // The catalogue finds the committed part by search; the view lives in the URL.
  await page.goto(`${inject("appUrl")}/catalogue`);
  await page.getByLabel("Search manufacturer or part number").fill("OSK4560N");
  await page.getByRole("button", { name: "Apply filters" }).click();
  await page.waitForURL((url) => url.searchParams.get("q") === "OSK4560N");
  const table = page.getByTestId("catalogue-table");
  await expect.poll(() => table.locator("tbody tr").count()).toBe(1);
  expect(await table.locator("tbody tr").first().textContent()).toContain("Ostrevik Semiconductor");
  expect(await page.getByTestId("result-count").first().textContent()).toBe("1–1 of 1 part");
  await page.screenshot({ path: artifactPath("catalogue-search.png"), fullPage: true, caret: "initial" });

  await table.getByRole("link", { name: "OSK4560N" }).click();
  await page.waitForURL(/\/catalogue\/[0-9a-f-]{36}$/);
  await expect.poll(() => page.textContent("h1")).toContain("OSK4560N");
  const plot = page.getByTestId("gain-plot");
  expect(await plot.evaluate((node) => node.tagName.toLowerCase())).toBe("svg");
  expect(await plot.locator('g[data-series="min"] circle').count()).toBe(2);
  expect(await plot.locator('g[data-series="typ"] circle').count()).toBe(2);
  // The revision history names the intake that brought the part in.
  expect(await page.getByTestId("revisions").textContent()).toContain("parts-messy.csv");
  await page.screenshot({ path: artifactPath("part-page.png"), fullPage: true, caret: "initial" });

  // An operating point outside the quoted window is marked and flagged.
  await page.getByLabel("Operating IC").fill("500 mA");
  await page.getByRole("button", { name: "Mark" }).click();
  await page.waitForURL((url) => url.searchParams.get("ic") === "500 mA");
  await expect.poll(() => page.getByTestId("operating-point").textContent()).toContain("gain-off-point");
  expect(await plot.locator('g[data-series="operating-point"]').count()).toBe(1);
  await page.screenshot({ path: artifactPath("part-page-operating-point.png"), fullPage: true, caret: "initial" });

  // A second file corrects VCEO of the same part; the first intake can then not be rolled back on its own.
  const [header, , , row4] = readFileSync(MESSY_FILE, "utf8").split(/\r?\n/);
  const correction = `${header}\n${row4!.replace("SOT-23,,28,36,", "SOT-23,,30,36,")}\n`;
  await page.goto(`${inject("appUrl")}/intakes/new`);
  await page.getByTestId("drop-zone-input").setInputFiles({ name: "osk4560n-vceo.csv", mimeType: "text/csv", buffer: Buffer.from(correction) });
  await page.getByRole("button", { name: "Upload and preview" }).click();
  await page.waitForURL((url) => /\/intakes\/[0-9a-f-]{36}$/.test(url.pathname) && url.href !== intakeUrl);
  await expect.poll(() => page.textContent("h1")).toBe("osk4560n-vceo.csv");
  const change = page.locator('[data-change-row="2"]');
  await expect.poll(() => change.locator("tbody tr").first().locator("td").allTextContents()).toEqual(["VCEO", "28 V", "→", "30 V"]);
  await page.screenshot({ path: artifactPath("intake-change-preview.png"), fullPage: true, caret: "initial" });
  await page.getByRole("button", { name: "Commit 1 part" }).click();
  await expect.poll(() => page.locator("[data-state]").first().getAttribute("data-state")).toBe("committed");

  // Rolling back asks for a confirmation first; the server's refusal names the later intake.
  await page.goto(intakeUrl);
  await page.getByText("Roll back this intake…").click();
  await page.screenshot({ path: artifactPath("intake-rollback-confirm.png"), fullPage: true, caret: "initial" });
  await page.getByRole("button", { name: "Yes, roll back parts-messy.csv" }).click();
  await expect.poll(() => page.getByRole("alert").first().textContent()).toContain("osk4560n-vceo.csv");
  expect(await page.locator("[data-state]").first().getAttribute("data-state")).toBe("committed");
  await page.screenshot({ path: artifactPath("intake-rollback-refused.png"), fullPage: true, caret: "initial" });
  expect(pageErrors).toEqual([]);
});

it("without JavaScript the drop zone is a plain upload form that still reaches the preview", async () => {
  const context = await browser.newContext({ javaScriptEnabled: false });
  const page = await context.newPage();
  await signIn(page, LIBRARIAN);
  await page.goto(`${inject("appUrl")}/intakes/new`);
  await page.locator('input[type="file"][name="file"]').setInputFiles(GOOD_FILE);
  await page.getByRole("button", { name: "Upload and preview" }).click();
  await page.waitForURL(/\/intakes\/[0-9a-f-]{36}$/);
  expect(await page.textContent("h1")).toBe("parts-three-gain-points.csv");
  expect(await page.locator("[data-state]").first().getAttribute("data-state")).toBe("previewed");
  await page.screenshot({ path: artifactPath("intake-preview-no-js.png"), fullPage: true, caret: "initial" });
  await context.close();
});
