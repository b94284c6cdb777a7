import { expect, type Page } from "@playwright/test";
import { mkdirSync } from "node:fs";

export const ARTIFACTS = "e2e-artifacts";
mkdirSync(ARTIFACTS, { recursive: true });

/** Records every request that leaves the page's own origin (blob: and data: stay on the page). */
export function watchForeignRequests(page: Page, baseURL: string | undefined): string[] {
  const foreign: string[] = [];
  const origin = new URL(baseURL ?? "http://127.0.0.1").origin;
  page.on("request", (request) => {
    const url = request.url();
    if (url.startsWith("data:") || url.startsWith("blob:")) return;
    if (new URL(url).origin !== origin) foreign.push(url);
  });
  return foreign;
}

export async function shot(page: Page, name: string, fullPage = false): Promise<void> {
  await page.screenshot({ path: `${ARTIFACTS}/${name}.png`, fullPage });
}

export async function screen(page: Page, name: string): Promise<void> {
  // A tab's name may carry a count ("Parts 308").
  await page.getByRole("navigation", { name: "Screens" }).getByRole("button", { name: new RegExp(`^${name}(\\s|$)`) }).click();
  await expect(page.getByRole("heading", { level: 1 }).first()).toBeVisible();
}

export const rankedTable = (page: Page) => page.getByRole("table", { name: "Ranked parts" });

/** Waits until the table shows a finished ranking of `rows` parts. */
export async function rankingSettled(page: Page, rows?: number): Promise<void> {
  const table = rankedTable(page);
  await expect(table).toHaveAttribute("aria-busy", "false", { timeout: 30_000 });
  if (rows !== undefined) await expect(table).toHaveAttribute("data-rows", String(rows), { timeout: 30_000 });
}

/** Waits for the save to IndexedDB, so that a reload finds everything. */
export async function saved(page: Page): Promise<void> {
  await expect(page.getByText("Kept in this browser")).toBeVisible({ timeout: 10_000 });
}

export async function dismissCautions(page: Page): Promise<void> {
  await page.getByRole("button", { name: "Understood" }).click();
  await expect(page.getByRole("note", { name: /before you rely/i })).toHaveCount(0);
}
