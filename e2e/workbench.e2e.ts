import { expect, test, type Page } from "@playwright/test";
import { readFileSync } from "node:fs";
import { dismissCautions, rankedTable, rankingSettled, saved, screen, shot, watchForeignRequests } from "./helpers.ts";

/** The demo spec typed in by hand, as a designer starting afresh would. */
async function typeDemoSpec(page: Page): Promise<void> {
  const fields: [string, string][] = [
    ["#spec-vin-min", "10.8"],
    ["#spec-vin-nom", "12"],
    ["#spec-vin-max", "13.2"],
    ["#spec-vout", "3.3"],
    ["#spec-iout-min", "0.2"],
    ["#spec-iout-max", "3"],
    ["#spec-fsw", "500k"],
    ["#spec-switchResistance", "30m"],
    ["#spec-rectifierDrop", "0.4"],
    ["#spec-ambient", "40"],
  ];
  for (const [id, value] of fields) await page.locator(id).fill(value);
}

/** The first `n` part numbers of the table, top to bottom. */
async function topParts(page: Page, n: number): Promise<string[]> {
  const rows = rankedTable(page).getByRole("row");
  const out: string[] = [];
  for (let k = 1; k <= n; k++) out.push((await rows.nth(k).getByRole("cell").nth(1).innerText()).trim());
  return out;
}

test("from a vendor file to a compared shortlist, kept across a reload", async ({ page, baseURL }) => {
  test.setTimeout(120_000);
  const foreign = watchForeignRequests(page, baseURL);
  await page.goto("/");
  await dismissCautions(page);
  await rankingSettled(page, 308);

  // A fresh design: the demo goes, the spec is typed in.
  await page.getByText("Workspace", { exact: true }).click();
  await page.getByRole("button", { name: "Start a fresh design…" }).click();
  await page.getByRole("button", { name: "Start fresh" }).click();
  await page.getByText("Workspace", { exact: true }).click();
  await expect(page.getByRole("heading", { name: "Design", level: 1 })).toBeVisible();
  await typeDemoSpec(page);
  await page.locator("#spec-fsw").fill("500kk");
  await expect(page.locator("#spec-fsw-error")).toContainText("not a unit");
  await expect(page.getByRole("status").filter({ hasText: "1 problem" })).toBeVisible();
  await shot(page, "02-design-bad-input");
  await expect(page.locator("#spec-fsw")).toHaveValue("500kk");
  await page.locator("#spec-fsw").fill("500k");
  await expect(page.locator("#spec-fsw-read")).toHaveText("= 500 kHz");
  await page.locator("#spec-vout").fill("15");
  await expect(page.locator("#spec-vout-error")).toContainText("buck needs vout below vin");
  await page.locator("#spec-vout").fill("3.3");
  await expect(page.getByText("The spec is complete")).toBeVisible();
  await expect(page.getByRole("region", { name: "Required inductance" })).toContainText("µH");
  await shot(page, "03-design", true);

  // A vendor file whose inductance column has a header nobody could recognise.
  const text = readFileSync("sample-parts/demo-variant-tabbed.tsv", "utf8").replace("L0 [nH]", "Wert");
  await screen(page, "Parts");
  await page.locator("#file-input").setInputFiles({ name: "tarnwick-stock.tsv", mimeType: "text/tab-separated-values", buffer: Buffer.from(text) });
  const card = page.getByRole("article", { name: "tarnwick-stock.tsv" });
  await expect(card).toContainText("No part could be read");
  await shot(page, "04-parts-unreadable");
  await card.getByLabel("Read column Wert as").selectOption("inductance");
  await card.getByLabel("Unit of column Wert").fill("nX");
  await expect(card.getByText('"nX" is not a unit')).toBeVisible();
  await expect(card.getByRole("button", { name: /Apply 1 change/ })).toBeDisabled();
  await card.getByLabel("Unit of column Wert").fill("nH");
  await card.getByRole("button", { name: /Apply 1 change/ }).click();
  await expect(card.getByRole("status").first()).toContainText("60 parts");
  await expect(card).toContainText("1 column choice(s) of yours");
  await shot(page, "05-parts-fixed", true);

  // Ranked.
  await screen(page, "Ranking");
  await rankingSettled(page, 60);
  await expect(rankedTable(page).getByRole("row").nth(1)).toContainText("✓ pass");
  const [firstPart] = await topParts(page, 1);
  await rankedTable(page).getByRole("button", { name: `Reasons for ${firstPart}` }).click();
  await expect(rankedTable(page)).toContainText("Saturation: peak");
  await shot(page, "06-ranking");

  // A part's waveform.
  await rankedTable(page).getByRole("button", { name: firstPart!, exact: true }).click();
  await expect(page.getByRole("heading", { name: firstPart!, level: 1 })).toBeVisible();
  await expect(page.getByRole("img", { name: /Inductor current over 3 periods/ })).toBeVisible();
  await expect(page.locator("figcaption").first()).toContainText("Mode: continuous conduction (CCM)");
  await page.locator("#detail-iout").selectOption("min");
  await expect(page.locator("figcaption").first()).toContainText("Mode: discontinuous conduction (DCM)");
  await shot(page, "07-part-detail", true);

  // Three on the shortlist.
  await screen(page, "Ranking");
  const three = await topParts(page, 3);
  for (const pn of three) await rankedTable(page).getByRole("button", { name: `Add to shortlist: ${pn}` }).click();
  await expect(page.getByRole("navigation", { name: "Screens" }).getByRole("button", { name: /Compare\s*3/ })).toBeVisible();

  await screen(page, "Compare");
  const compare = page.getByRole("table", { name: /Shortlisted parts compared/ });
  for (const pn of three) await expect(compare.getByRole("columnheader", { name: new RegExp(pn) })).toBeVisible();
  await expect(compare.getByText("★ best").first()).toBeVisible();
  await expect(page.getByRole("img", { name: /Inductor currents of 3 parts/ })).toBeVisible();
  await shot(page, "08-compare", true);

  await screen(page, "Sweeps");
  await expect(page.getByRole("heading", { name: "Temperature rise against load current" })).toBeVisible();
  await shot(page, "09-sweeps", true);

  await screen(page, "Trade-off");
  await page.getByRole("button", { name: /^Select / }).first().click();
  await expect(page.getByRole("region", { name: "Selected part" })).toContainText("Pareto-optimal");
  await shot(page, "10-tradeoff", true);

  // Vin max up: the ranking follows.
  await screen(page, "Ranking");
  const summary = page.getByRole("status").filter({ hasText: /60 parts: ✓/ });
  const before = await summary.innerText();
  const orderBefore = await topParts(page, 10);
  // A quick re-ranking is announced (aria-busy) but not drawn: no dimmed table, no progress bar flashing by.
  await page.evaluate(() => {
    const w = globalThis as unknown as { __marks: string[] };
    w.__marks = [];
    new MutationObserver(() => {
      if (document.querySelector(".rtable.stale") !== null) w.__marks.push("dimmed");
      if (document.querySelector('.table-meta [role="progressbar"]') !== null) w.__marks.push("progress");
    }).observe(document.body, { subtree: true, childList: true, attributes: true });
  });
  await page.locator("#quick-vin-max").fill("24");
  await expect(summary).not.toHaveText(before, { timeout: 30_000 });
  await rankingSettled(page, 60);
  expect(await topParts(page, 10)).not.toEqual(orderBefore);
  expect(await page.evaluate(() => (globalThis as unknown as { __marks: string[] }).__marks)).toEqual([]);
  await shot(page, "11-ranking-vin-max-24");

  // Everything kept across a reload.
  await saved(page);
  await page.reload();
  await expect(page.getByRole("note", { name: /before you rely/i })).toHaveCount(0);
  await expect(page.getByRole("heading", { name: "Ranking", level: 1 })).toBeVisible();
  await expect(page.locator("#quick-vin-max")).toHaveValue("24");
  await rankingSettled(page, 60);
  await expect(page.getByRole("navigation", { name: "Screens" }).getByRole("button", { name: /Compare\s*3/ })).toBeVisible();
  await screen(page, "Parts");
  await expect(page.getByRole("article", { name: "tarnwick-stock.tsv" })).toContainText("1 column choice(s) of yours");
  await screen(page, "Compare");
  for (const pn of three) await expect(page.getByRole("table", { name: /Shortlisted parts compared/ }).getByRole("columnheader", { name: new RegExp(pn) })).toBeVisible();

  expect(foreign).toEqual([]);
});
