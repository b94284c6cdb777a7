import { createStore, del, get, set } from "idb-keyval";
import type { KeyValueStore } from "./persistence.ts";

/**
 * IndexedDB through idb-keyval, or null when the browser refuses it (private windows, storage
 * disabled): the app then runs and says that nothing will be kept.
 */
export async function openBrowserStorage(): Promise<KeyValueStore | null> {
  if (typeof indexedDB === "undefined") return null;
  try {
    const db = createStore("coilsift", "workspace");
    await set("coilsift/probe", 1, db);
    return {
      get: (key) => get(key, db),
      set: (key, value) => set(key, value, db),
      del: (key) => del(key, db),
    };
  } catch {
    return null;
  }
}
