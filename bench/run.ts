import { benchEngineRank } from "./engineRank.bench.ts";
import { gcAvailable } from "./measure.ts";

/** `npm run bench [engine|catalog|ui]`: figures only, never pass/fail. */
async function main(): Promise<void> {
  if (!gcAvailable()) console.log("note: run with node --expose-gc for forced collections between runs");
  const only = process.argv[2];
  const benches: [string, () => Promise<string[]>][] = [["engine", () => benchEngineRank()]];
  try {
    const { benchCatalogImport } = await import("./catalogImport.bench.ts");
    benches.push(["catalog", benchCatalogImport]);
  } catch (error) {
    console.log(`catalog import bench not available: ${(error as Error).message}`);
  }
  try {
    const { benchUiRanking } = await import("./uiRank.bench.ts");
    benches.push(["ui", benchUiRanking]);
  } catch (error) {
    console.log(`browser ranking bench not available: ${(error as Error).message}`);
  }
  for (const [name, bench] of benches) {
    if (only !== undefined && only !== name) continue;
    for (const line of await bench()) console.log(line);
  }
}

await main();
