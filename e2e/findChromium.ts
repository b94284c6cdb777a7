import { existsSync } from "node:fs";

/** Debian's Chromium, or the one named by COILSIFT_CHROMIUM; never a downloaded browser. */
export function findChromium(): string {
  const candidates = [process.env.COILSIFT_CHROMIUM, "/usr/bin/chromium", "/usr/bin/chromium-browser"].filter(
    (p): p is string => typeof p === "string" && p.length > 0,
  );
  const found = candidates.find((p) => existsSync(p));
  if (found === undefined) {
    throw new Error(
      "No Chromium found for the browser tests. Install Debian's package (apt-get install -y chromium) or set COILSIFT_CHROMIUM to a Chromium executable.",
    );
  }
  return found;
}

export const CHROMIUM_FLAGS = ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"];
