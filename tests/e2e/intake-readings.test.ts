// A hurried librarian's file in a real browser, at phone and desktop widths: the preview shows what each typed form
// was read as, the rejected rows can be downloaded, and the formats page says how numbers are read.
import path from "node:path";
import { afterAll, beforeAll, expect, inject, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { artifactPath, launchBrowser } from "../setup/browser.ts";
import { signInCodeFrom, waitForMail } from "../setup/mail-catcher.ts";

const TYPED_FILE = path.resolve(import.meta.dirname, "../../fixtures/intake/bad/parts-typed-forms.csv");
const LIBRARIAN = "librarian@larkfield.example.com";

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function signIn(page: Page): Promise<void> {
  await page.goto(`${inject("appUrl")}/sign-in`);
  const since = Date.now();
  await page.getByLabel("E-mail address").fill(LIBRARIAN);
  await page.getByRole("button", { name: "Send me a code" }).click();
  await page.waitForURL("**/sign-in/verify");
  await page.getByLabel("Code").fill(signInCodeFrom(await waitForMail(inject("mailDir"), LIBRARIAN, since)));
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => url.pathname === "/");
}

it("shows each reading of a typed file and offers its rejected rows, at 390 px and 1366 px", async () => {
  const page = await browser.newPage({ viewport: { width: 1366, height: 900 } });
  const pageErrors: string[] = [];
  page.on("pageerror", (error) => pageErrors.push(error.message));
  await signIn(page);

  await page.goto(`${inject("appUrl")}/intakes/new`);
  const input = page.getByTestId("drop-zone-input");
  await input.waitFor({ state: "attached" });
  await input.setInputFiles(TYPED_FILE);
  await page.getByRole("button", { name: "Upload and preview" }).click();
  await page.waitForURL(/\/intakes\/[0-9a-f-]{36}$/);

  const readings = page.getByTestId("readings-table");
  const lifecycle = readings.locator("tbody tr", { hasText: "EOL" });
  await expect.poll(() => lifecycle.locator("td").allTextContents()).toEqual(["lifecycle", "EOL", "read as obsolete", "1", "2"]);
  expect(await readings.locator("tbody tr", { hasText: "100-300" }).locator("td").nth(2).textContent()).toBe("read as hFE min 100, hFE max 300");
  const download = page.getByRole("link", { name: "Download the 3 rejected rows" });
  expect(await download.getAttribute("href")).toMatch(/\/intakes\/[0-9a-f-]{36}\/rejected$/);
  expect(await page.getByRole("button", { name: /^Commit 3 parts$/ }).count()).toBe(1);
  await page.screenshot({ path: artifactPath("intake-readings-1366.png"), fullPage: true });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: artifactPath("intake-readings-390.png"), fullPage: true });

  await page.goto(`${inject("appUrl")}/intakes/formats`);
  expect(await page.textContent("body")).toContain("Tab-separated files: a dot or a comma is the decimal mark");
  await page.screenshot({ path: artifactPath("intake-formats-390.png"), fullPage: true });
  expect(pageErrors).toEqual([]);
  await page.close();
});
