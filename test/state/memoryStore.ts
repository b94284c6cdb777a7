import type { KeyValueStore } from "../../src/state/persistence.ts";

/** IndexedDB stand-in: values are structured-cloned in and out, like the real thing. */
export class MemoryStore implements KeyValueStore {
  readonly map = new Map<string, unknown>();
  async get(key: string): Promise<unknown> {
    const v = this.map.get(key);
    return v === undefined ? undefined : structuredClone(v);
  }
  async set(key: string, value: unknown): Promise<void> {
    this.map.set(key, structuredClone(value));
  }
  async del(key: string): Promise<void> {
    this.map.delete(key);
  }
}
