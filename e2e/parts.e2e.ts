import { expect, test } from "@playwright/test";
import { readFileSync } from "node:fs";
import { dismissCautions, rankingSettled, screen, shot } from "./helpers.ts";

test("rejected rows are listed with their reasons and download as CSV; warnings are listed", async ({ page }) => {
  await page.goto("/");
  await dismissCautions(page);
  await screen(page, "Parts");
  await page.locator("#file-input").setInputFiles("sample-parts/demo-messy.csv");
  const card = page.getByRole("article", { name: "demo-messy.csv" });
  await expect(card.getByRole("status").first()).toContainText("rejected");
  await card.getByText(/^Rejected rows \(\d+\)$/).click();
  await expect(card.getByRole("cell", { name: /inductance/i }).first()).toBeVisible();
  await shot(page, "parts-rejected-rows", true);
  const [download] = await Promise.all([page.waitForEvent("download"), card.getByRole("button", { name: /Download the \d+ rejected rows as CSV/ }).click()]);
  expect(download.suggestedFilename()).toBe("demo-messy-rejected-rows.csv");
  const csv = readFileSync(await download.path(), "utf8");
  expect(csv.split("\r\n")[0]).toMatch(/^line,field,column,reason,cell 1/);
  expect(csv).toContain("HV-DRS12060-3U3");
});

test("a pasted list is imported; a large import can be cancelled and leaves nothing behind", async ({ page }) => {
  await page.goto("/");
  await dismissCautions(page);
  await screen(page, "Parts");
  const demo = readFileSync("sample-parts/demo-parts.csv", "utf8").split("\n");
  await page.locator("#paste-text").fill(demo.slice(0, 21).join("\n"));
  await page.getByRole("button", { name: "Import pasted list" }).click();
  await expect(page.getByRole("article", { name: "Pasted list 1" }).getByRole("status").first()).toContainText("20 parts");

  const rows = [demo[0]!];
  for (let i = 0; i < 150_000; i++) rows.push(demo[1 + (i % 300)]!.replace(/^([^,]+)/, `$1-${i}`));
  await page.locator("#file-input").setInputFiles({ name: "huge.csv", mimeType: "text/csv", buffer: Buffer.from(rows.join("\n")) });
  const pending = page.getByRole("region", { name: "Imports in progress" });
  await expect(pending.getByRole("progressbar")).toBeVisible();
  await shot(page, "parts-import-progress");
  await pending.getByRole("button", { name: "Cancel import" }).click();
  await expect(pending).toHaveCount(0);
  await expect(page.getByRole("article", { name: "huge.csv" })).toHaveCount(0);
  await expect(page.getByRole("article")).toHaveCount(2);
});

test("the screens, the table's sort and the shortlist work from the keyboard", async ({ page }) => {
  await page.goto("/");
  await page.keyboard.press("Enter"); // the cautions' button has the focus
  await rankingSettled(page, 308);
  const tabs = page.getByRole("navigation", { name: "Screens" });
  await tabs.getByRole("button", { name: /^Design/ }).focus();
  await page.keyboard.press("Enter");
  await expect(page.getByRole("heading", { name: "Design", level: 1 })).toBeVisible();
  await tabs.getByRole("button", { name: /^Ranking/ }).focus();
  await page.keyboard.press("Space");
  await rankingSettled(page, 308);
  await page.getByRole("button", { name: /^Loss\. Click to sort|Loss/ }).first().focus();
  await page.keyboard.press("Enter");
  await expect(page.getByRole("columnheader", { name: /Loss/ })).toHaveAttribute("aria-sort", "ascending");
  const add = page.getByRole("button", { name: /^Add to shortlist: / }).first();
  await add.focus();
  await page.keyboard.press("Enter");
  await expect(tabs.getByRole("button", { name: /Compare\s*1/ })).toBeVisible();
});
