/**
 * Case-insensitive string → number index for part numbers. An open-addressing table over an
 * Int32Array instead of a Map: on 100 000 fresh strings a Map's hashing and growth cost as much
 * as converting the rows, and this keeps no per-entry objects for the collector. ASCII letters
 * fold in place; keys with other characters are folded once with toUpperCase.
 */
export class KeyIndex {
  /**
   * Open addressing, two Int32 words per slot: [entry + 1, hash]. The hash beside the entry lets
   * a probe pass an occupied slot without touching the keys: with 100 000 keys the table is
   * larger than the caches and every separate array read was a miss.
   */
  private slots = new Int32Array(2048);
  private mask = 1023;
  private readonly keys: string[] = [];
  private readonly values: number[] = [];

  get size(): number {
    return this.keys.length;
  }

  get(key: string): number | undefined {
    let k = key;
    let h = asciiHash(key);
    if (h < 0) h = hash((k = key.toUpperCase()));
    for (let s = h & this.mask; ; s = (s + 1) & this.mask) {
      const e = this.slots[2 * s] as number;
      if (e === 0) return undefined;
      if (this.slots[2 * s + 1] === h && sameFolded(this.keys[e - 1] as string, k)) return this.values[e - 1];
    }
  }

  set(key: string, value: number): void {
    this.put(key, value);
  }

  /** Sets the key's value and returns the one it replaces (undefined for a new key): one hash for both. */
  put(key: string, value: number): number | undefined {
    let k = key;
    let h = asciiHash(key);
    if (h < 0) h = hash((k = key.toUpperCase()));
    for (let s = h & this.mask; ; s = (s + 1) & this.mask) {
      const e = this.slots[2 * s] as number;
      if (e === 0) {
        this.keys.push(k);
        this.values.push(value);
        this.slots[2 * s] = this.keys.length;
        this.slots[2 * s + 1] = h;
        if (this.keys.length * 2 > this.mask) this.grow();
        return undefined;
      }
      if (this.slots[2 * s + 1] === h && sameFolded(this.keys[e - 1] as string, k)) {
        const earlier = this.values[e - 1];
        this.values[e - 1] = value;
        return earlier;
      }
    }
  }

  private grow(): void {
    const old = this.slots;
    const size = (this.mask + 1) * 4;
    this.slots = new Int32Array(2 * size);
    this.mask = size - 1;
    for (let o = 0; o < old.length; o += 2) {
      const e = old[o] as number;
      if (e === 0) continue;
      const h = old[o + 1] as number;
      let s = h & this.mask;
      while (this.slots[2 * s] !== 0) s = (s + 1) & this.mask;
      this.slots[2 * s] = e;
      this.slots[2 * s + 1] = h;
    }
  }
}

function upper(c: number): number {
  return c >= 97 && c <= 122 ? c - 32 : c;
}

/** hash(key) for an ASCII key in one pass, -1 when the key holds another character (fold it first). */
function asciiHash(key: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < key.length; i++) {
    const c = key.charCodeAt(i);
    if (c > 127) return -1;
    h = Math.imul(h ^ upper(c), 0x01000193);
  }
  return h & 0x7fffffff;
}

/** FNV-1a over upper-cased ASCII, kept to 31 bits so that it fits an Int32Array slot. */
function hash(key: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < key.length; i++) h = Math.imul(h ^ upper(key.charCodeAt(i)), 0x01000193);
  return h & 0x7fffffff;
}

function sameFolded(a: string, b: string): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (upper(a.charCodeAt(i)) !== upper(b.charCodeAt(i))) return false;
  return true;
}
