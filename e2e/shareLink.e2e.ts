import { expect, test } from "@playwright/test";
import { readFileSync } from "node:fs";
import { dismissCautions, saved, screen } from "./helpers.ts";

test("the spec travels as a link; a damaged link is refused with a message and changes nothing", async ({ page, browser, baseURL }) => {
  await page.goto("/");
  await dismissCautions(page);
  await screen(page, "Design");
  await page.locator("#spec-vout").fill("2.5");
  await page.locator("#spec-fsw").fill("1.2M");
  await saved(page);
  await page.getByText("Workspace", { exact: true }).click();
  const link = await page.locator("#share-link").inputValue();
  expect(link).toMatch(/#spec=[A-Za-z0-9_-]+$/);
  expect(link.length).toBeLessThan(600);

  // Someone else opens it: a browser with nothing saved.
  const other = await browser.newContext(baseURL === undefined ? {} : { baseURL });
  const theirs = await other.newPage();
  await theirs.goto(link);
  await expect(theirs.getByText("The spec from the link is loaded")).toBeVisible();
  await dismissCautions(theirs);
  await expect(theirs.locator("#spec-vout")).toHaveValue("2.5");
  await expect(theirs.locator("#spec-fsw-read")).toHaveText("= 1.2 MHz");
  expect(new URL(theirs.url()).hash).toBe("");

  await theirs.goto("/#spec=bm90IGpzb24");
  await expect(theirs.getByText(/The spec in the link was not loaded/)).toBeVisible();
  await screen(theirs, "Design");
  await expect(theirs.locator("#spec-vout")).toHaveValue("2.5");
  await other.close();
});

test("a project file saves the whole workspace and opens it elsewhere; a file that is not one is refused", async ({ page, browser, baseURL }) => {
  await page.goto("/");
  await dismissCautions(page);
  await screen(page, "Design");
  await page.locator("#design-name").fill("Bench supply 5 V");
  await page.locator("#spec-iout-max").fill("2.2");
  await page.getByText("Workspace", { exact: true }).click();
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Save project file" }).click()]);
  expect(download.suggestedFilename()).toBe("coilsift-project-bench-supply-5-v.json");
  const path = await download.path();

  const other = await browser.newContext(baseURL === undefined ? {} : { baseURL });
  const theirs = await other.newPage();
  await theirs.goto("/");
  await dismissCautions(theirs);
  await theirs.getByText("Workspace", { exact: true }).click();
  await theirs.getByLabel("Project file to open").setInputFiles({ name: "notes.json", mimeType: "application/json", buffer: Buffer.from('{"hello": 1}') });
  await expect(theirs.getByRole("alert")).toContainText("notes.json was not opened");
  await theirs.getByLabel("Project file to open").setInputFiles({ name: "bench-supply.json", mimeType: "application/json", buffer: readFileSync(path) });
  await expect(theirs.getByText("bench-supply.json is open.")).toBeVisible();
  await expect(theirs.locator(".topbar-design")).toHaveText("Bench supply 5 V");
  await screen(theirs, "Design");
  await expect(theirs.locator("#spec-iout-max")).toHaveValue("2.2");
  await other.close();
});
