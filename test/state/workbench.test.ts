import { afterEach, describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { startApp, type RunningApp } from "../../src/state/bootstrap.ts";
import { workspaceStore } from "../../src/state/workspaceStore.ts";
import { catalogStore } from "../../src/state/catalogStore.ts";
import { rankingStore } from "../../src/state/rankingStore.ts";
import { draftStore } from "../../src/state/draftStore.ts";
import { noticeStore } from "../../src/state/noticeStore.ts";
import { mappingMemory } from "../../src/state/mappingMemory.ts";
import { editField } from "../../src/state/designActions.ts";
import { addToShortlist, removeListSource, startFresh } from "../../src/state/workspaceActions.ts";
import { applyMapping, cancelImport, importNewList } from "../../src/state/catalogController.ts";
import { specHash } from "../../src/state/shareLink.ts";
import { demoSpec } from "../../src/state/demoScenario.ts";
import { screenParts } from "../../src/engine/screenParts.ts";
import { FakeImportWorker, FakeRankWorker } from "../worker/fakeWorkers.ts";
import { MemoryStore } from "./memoryStore.ts";

let app: RunningApp | null = null;
afterEach(() => {
  app?.stop();
  app = null;
  noticeStore.setState({ notices: [] });
  mappingMemory.setState({ bySignature: {} });
});

async function until(condition: () => boolean, what: string, ms = 10_000): Promise<void> {
  const end = Date.now() + ms;
  while (!condition()) {
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 5));
  }
}

const ranked = () => rankingStore.getState().status === "ready" && rankingStore.getState().version === catalogStore.getState().merged.version;

async function start(storage: MemoryStore | null, hash = "") {
  app = await startApp({
    storage,
    spawnImport: () => new FakeImportWorker(),
    spawnRank: () => new FakeRankWorker(),
    rankWorkers: 2,
    hash,
    clearHash: () => {},
  });
  return app;
}

describe("workbench state", () => {
  it("startApp on first start opens the demo and ranks it as screenParts does", async () => {
    await start(new MemoryStore());
    expect(workspaceStore.getState().view.screen).toBe("ranking");
    expect(workspaceStore.getState().view.cautionsAcknowledged).toBe(false);
    await until(() => ranked() && catalogStore.getState().merged.parts.length > 0, "the demo ranking");
    const { parts } = catalogStore.getState().merged;
    expect(Array.from(rankingStore.getState().ranking!.order)).toEqual(Array.from(screenParts(demoSpec(), parts).order));
  });

  it("editField re-ranks for a valid spec and keeps a bad text without touching the spec", async () => {
    await start(new MemoryStore());
    await until(ranked, "the demo ranking");
    const serial = rankingStore.getState().serial;
    editField("vin.max", "30");
    expect(workspaceStore.getState().spec.vin.max).toBe(30);
    await until(() => ranked() && rankingStore.getState().serial > serial, "the re-ranking");
    expect(rankingStore.getState().spec?.vin.max).toBe(30);
    editField("vin.max", "30 volts");
    expect(draftStore.getState().draft["vin.max"]).toBe("30 volts");
    expect(draftStore.getState().reading.spec).toBeNull();
    expect(workspaceStore.getState().spec.vin.max).toBe(30);
  });

  it("a reload finds the spec, lists, column choices, shortlist, view and the draft's bad text", async () => {
    const storage = new MemoryStore();
    const first = await start(storage);
    await until(ranked, "the demo ranking");
    const text = readFileSync("sample-parts/demo-variant-semicolon.csv", "utf8");
    importNewList({ name: "variant.csv", text });
    await until(() => workspaceStore.getState().lists.length === 2 && ranked(), "the second list");
    const id = workspaceStore.getState().lists[1]!.id;
    applyMapping(id, [{ header: "Price", quantity: "ignore", unit: null }]);
    await until(() => workspaceStore.getState().lists[1]!.mapping.length === 1 && !catalogStore.getState().lists[id]!.reimporting, "the re-import");
    expect(addToShortlist("HV-DRS2512-U33")).toBe("added");
    editField("iout.max", "2.5");
    editField("fsw", "5OOk");
    await first.saver!.flush();
    first.stop();
    app = null;

    workspaceStore.setState({ shortlist: [], lists: [] });
    await start(storage);
    const w = workspaceStore.getState();
    expect(w.lists.map((l) => l.name)).toEqual(["demo-parts.csv", "variant.csv"]);
    expect(w.lists[1]!.mapping).toEqual([{ header: "Price", quantity: "ignore", unit: null }]);
    expect(w.lists[1]!.text).toBe(text);
    expect(w.shortlist).toEqual(["HV-DRS2512-U33"]);
    expect(w.spec.iout.max).toBe(2.5);
    expect(draftStore.getState().draft["fsw"]).toBe("5OOk");
    expect(Object.keys(mappingMemory.getState().bySignature)).toHaveLength(1);
    await until(() => ranked() && catalogStore.getState().merged.parts.length > 300, "the restored ranking");
  });

  it("a new file with a remembered header layout is read with the remembered choices", async () => {
    await start(new MemoryStore());
    const text = readFileSync("sample-parts/demo-variant-tabbed.tsv", "utf8");
    importNewList({ name: "a.tsv", text });
    await until(() => workspaceStore.getState().lists.length === 2, "the first import");
    const id = workspaceStore.getState().lists[1]!.id;
    applyMapping(id, [{ header: "Stock", quantity: "ignore", unit: null }]);
    await until(() => workspaceStore.getState().lists[1]!.mapping.length === 1, "the re-import");
    importNewList({ name: "b.tsv", text });
    await until(() => workspaceStore.getState().lists.length === 3, "the second import");
    expect(workspaceStore.getState().lists[2]!.mapping).toEqual([{ header: "Stock", quantity: "ignore", unit: null }]);
    expect(noticeStore.getState().notices.some((n) => /column choices saved/.test(n.text))).toBe(true);
  });

  it("cancelImport leaves the workspace as it was", async () => {
    await start(new MemoryStore());
    const token = importNewList({ name: "big.csv", text: readFileSync("sample-parts/demo-parts.csv", "utf8") });
    cancelImport(token);
    await new Promise((r) => setTimeout(r, 100));
    expect(workspaceStore.getState().lists).toHaveLength(1);
    expect(catalogStore.getState().pending).toEqual([]);
  });

  it("removing every list empties the ranking; startFresh clears lists and shortlist", async () => {
    await start(new MemoryStore());
    await until(ranked, "the demo ranking");
    addToShortlist("X");
    removeListSource("demo-parts");
    await until(() => rankingStore.getState().status === "idle", "an empty ranking");
    expect(rankingStore.getState().ranking).toBeNull();
    startFresh();
    expect(workspaceStore.getState().shortlist).toEqual([]);
    expect(workspaceStore.getState().view.screen).toBe("design");
  });

  it("startApp loads a spec from the link hash, and refuses a damaged one with a message", async () => {
    const spec = { ...demoSpec(), vout: 2.5 };
    await start(new MemoryStore(), `#${specHash(spec)}`);
    expect(workspaceStore.getState().spec).toEqual(spec);
    expect(draftStore.getState().draft["vout"]).toBe("2.5");
    app!.stop();
    await start(new MemoryStore(), "#spec=eyJ0b3BvbG9neSI6");
    expect(noticeStore.getState().notices.some((n) => n.tone === "error" && /damaged/.test(n.text))).toBe(true);
  });

  it("addToShortlist stops at six parts", async () => {
    await start(null);
    for (const pn of ["a", "b", "c", "d", "e", "f"]) expect(addToShortlist(pn)).toBe("added");
    expect(addToShortlist("g")).toBe("full");
    expect(addToShortlist("a")).toBe("already");
  });
});
