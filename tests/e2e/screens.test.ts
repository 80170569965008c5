// Screenshots of every catalogue and intake page with the demo data, for people to look at (tests/artifacts/screen-*.png).
// Each step also checks the one thing the page is for, so a broken page fails here too.
import { afterAll, beforeAll, expect, inject, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { artifactPath, launchBrowser } from "../setup/browser.ts";
import { loginAs } from "../setup/browser-login.ts";

let browser: Browser;
let page: Page;
const pageErrors: string[] = [];

async function signIn(email: string): Promise<void> {
  await loginAs(page, email);
  await page.goto(`${inject("appUrl")}/`);
}

async function shoot(path: string, name: string): Promise<void> {
  await page.goto(`${inject("appUrl")}${path}`);
  await page.screenshot({ path: artifactPath(`screen-${name}.png`), fullPage: true, caret: "initial" });
}

beforeAll(async () => {
  browser = await launchBrowser();
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
  page.on("pageerror", (error) => pageErrors.push(error.message));
  page.on("console", (message) => {
    // The refused filter and the refused correction answer 400 on purpose; the browser logs each such answer.
    if (message.type() === "error" && !message.text().includes("status of 400")) pageErrors.push(message.text());
  });
  await signIn("librarian@larkfield.example.com");
});

afterAll(async () => {
  await browser?.close();
});

it("the catalogue: default view, hFE at a chosen IC, a refused filter and an empty result", async () => {
  await shoot("/catalogue", "catalogue");
  await page.screenshot({ path: artifactPath("screen-catalogue-top.png"), caret: "initial" });
  expect(await page.getByTestId("result-count").first().textContent()).toMatch(/^1–50 of \d+ parts · page 1 of \d+$/);

  await shoot("/catalogue?hfeAt=100mA&hfeMin=50&sort=hfe&dir=desc&cols=partNumber&cols=manufacturer&cols=vceo&cols=icMax&cols=hfe&cols=price&cols=stock&cols=flags", "catalogue-hfe");
  expect(await page.locator("thead").textContent()).toContain("hFE @ 100 mA");

  await shoot("/catalogue?vceoMin=30mA", "catalogue-invalid");
  expect(await page.locator("#vceoMin-error").textContent()).toContain("a current (mA) where a voltage is expected");

  await shoot("/catalogue?q=no-such-part&polarity=pnp", "catalogue-empty");
  expect(await page.getByTestId("empty-result").textContent()).toContain("No part in the catalogue matches");
});

it("a power part's page with its caution, offers and plot; its correction form refusing a bad value", async () => {
  await page.goto(`${inject("appUrl")}/catalogue?vceoMin=100V&hasOffers=yes&sort=ptot&dir=desc`);
  await page.getByTestId("catalogue-table").locator("tbody tr a").first().click();
  await page.waitForURL(/\/catalogue\/[0-9a-f-]{36}$/);
  await page.getByTestId("caution").waitFor();
  expect(await page.getByTestId("caution").textContent()).toContain("safe operating area govern");
  expect(await page.getByTestId("offers").locator("tbody > tr").count()).toBeGreaterThan(0);
  await page.screenshot({ path: artifactPath("screen-part-power.png"), fullPage: true, caret: "initial" });

  await page.getByRole("link", { name: "Correct this part" }).click();
  await page.waitForURL(/\/edit$/);
  await expect.poll(() => page.textContent("h1")).toContain("Correct ");
  await page.screenshot({ path: artifactPath("screen-part-edit.png"), fullPage: true, caret: "initial" });
  await page.getByLabel("IC max").fill("3 V");
  await page.getByRole("button", { name: "Save correction" }).click();
  await expect.poll(() => page.locator("#field-icMaxAmps-error").textContent()).toBe("a voltage (V) where a current is expected");
  expect(await page.getByLabel("IC max").inputValue()).toBe("3 V");
  await page.screenshot({ path: artifactPath("screen-part-edit-error.png"), fullPage: true, caret: "initial" });
});

it("the intake pages: list, formats, one intake", async () => {
  await shoot("/intakes", "intakes");
  const first = page.getByTestId("intakes").locator("tbody tr a").first();
  expect(await first.count()).toBe(1);
  await shoot("/intakes/formats", "formats");
  expect(await page.locator('table[data-format="parts"]').textContent()).toContain("gainN_hfe_min");
  expect(await page.locator('table[data-format="offers"]').textContent()).toContain("breakN_price");
  await page.goto(`${inject("appUrl")}/intakes`);
  await page.getByTestId("intakes").locator("tbody tr a").first().click();
  await page.waitForURL(/\/intakes\/[0-9a-f-]{36}$/);
  await page.getByTestId("problems-table").or(page.getByText("No problems")).first().waitFor();
  await page.screenshot({ path: artifactPath("screen-intake.png"), fullPage: true, caret: "initial" });
  expect(pageErrors).toEqual([]);
});
