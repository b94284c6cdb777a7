import { expect, test } from "@playwright/test";
import { dismissCautions, rankedTable, rankingSettled, screen, shot, watchForeignRequests } from "./helpers.ts";

test("first start shows the cautions over the demo, already ranked, and no request leaves the page's origin", async ({ page, baseURL }) => {
  const foreign = watchForeignRequests(page, baseURL);
  await page.goto("/");
  await expect(page.getByRole("note", { name: /before you rely/i })).toBeVisible();
  await expect(page.getByRole("note", { name: /before you rely/i })).toContainText("licensed engineering practice");
  await shot(page, "01-first-start-cautions");
  await dismissCautions(page);
  await rankingSettled(page, 308);
  const first = rankedTable(page).getByRole("row").nth(1);
  await expect(first).toContainText("✓ pass");
  await expect(page.getByRole("status").filter({ hasText: /308 parts: ✓ \d+ pass/ })).toBeVisible();
  // The cautions stay one click away.
  await page.getByRole("button", { name: "Cautions", exact: true }).click();
  await expect(page.getByRole("note", { name: /before you rely/i })).toBeVisible();
  await page.keyboard.press("Enter");
  await expect(page.getByRole("note", { name: /before you rely/i })).toHaveCount(0);
  await screen(page, "Ranking");
  expect(foreign).toEqual([]);
});

test("a narrow window keeps every screen readable", async ({ page }) => {
  await page.setViewportSize({ width: 760, height: 900 });
  await page.goto("/");
  await dismissCautions(page);
  await rankingSettled(page, 308);
  await shot(page, "narrow-ranking");
  await screen(page, "Design");
  await shot(page, "narrow-design");
  await screen(page, "Parts");
  await shot(page, "narrow-parts");
  await rankedTable(page).count();
});

test("every screen with the demo data", async ({ page }) => {
  await page.goto("/");
  await dismissCautions(page);
  await rankingSettled(page, 308);
  for (const pn of ["HV-DRS12060-6U8", "QC-PIR6035-6U8", "BF-MCX7040-6U8"]) await rankedTable(page).getByRole("button", { name: `Add to shortlist: ${pn}` }).click();
  await shot(page, "demo-ranking");
  await screen(page, "Design");
  await shot(page, "demo-design", true);
  await screen(page, "Parts");
  await shot(page, "demo-parts");
  await screen(page, "Part detail");
  await expect(page.getByRole("img", { name: /Inductor current over 3 periods/ })).toBeVisible();
  await shot(page, "demo-detail", true);
  await screen(page, "Compare");
  await shot(page, "demo-compare", true);
  await screen(page, "Sweeps");
  await shot(page, "demo-sweeps", true);
  await screen(page, "Trade-off");
  await expect(page.getByRole("img", { name: /Worst-case loss against volume/ })).toBeVisible();
  await page.getByRole("button", { name: /^Select / }).nth(1).click();
  await shot(page, "demo-tradeoff", true);
});
