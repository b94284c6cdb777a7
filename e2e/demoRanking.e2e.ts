import { expect, test } from "@playwright/test";
import { mkdirSync } from "node:fs";

const ARTIFACTS = "e2e-artifacts";
mkdirSync(ARTIFACTS, { recursive: true });

test("first start shows the cautions and the demo catalog ranked, and no request leaves the page's origin", async ({ page, baseURL }) => {
  const foreign: string[] = [];
  page.on("request", (request) => {
    if (!request.url().startsWith(baseURL!) && !request.url().startsWith("data:")) foreign.push(request.url());
  });
  await page.goto("/");
  await expect(page.getByRole("note", { name: /before you rely/i })).toBeVisible();
  await page.screenshot({ path: `${ARTIFACTS}/first-start.png`, fullPage: false });
  await page.getByRole("button", { name: "Understood" }).click();
  const rows = page.locator("table.ranking tbody tr");
  await expect(rows.first()).toContainText("pass");
  expect(await rows.count()).toBeGreaterThan(100);
  await expect(page.getByRole("heading", { name: /Ranking/ })).toContainText(/\d+ pass every check/);
  await page.screenshot({ path: `${ARTIFACTS}/ranking.png`, fullPage: false });
  expect(foreign).toEqual([]);
});
