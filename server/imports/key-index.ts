/**
 * The first line of each key in a file, for telling a row that repeats an earlier one (100k-row price
 * files). A Map of 100k fresh string keys cost about 90 ms of a 100k-row import here (its table is
 * rebuilt as it grows and points at young strings the garbage collector keeps visiting); this index
 * keeps its slots in one Int32Array sized once for the file (open addressing, linear probing) and the
 * keys in a plain list, about 15 ms for the same keys.
 *
 * Hashes are seeded per index and a probe run is bounded: a file crafted so that its keys collide
 * anyway makes the index hand its keys to a Map (V8's own seeded hashing) instead of slowing down.
 */

const EMPTY = -1;
/** Slots probed before the index gives up on its own table for the rest of the file. */
const MAX_PROBES = 64;

export class KeyIndex {
  private readonly keys: string[] = [];
  private readonly lines: number[] = [];
  private readonly slots: Int32Array;
  private readonly mask: number;
  private readonly seed = (Math.random() * 0x100000000) >>> 0;
  private fallback: Map<string, number> | null = null;

  /** `expected`: how many keys the file can hold at most (its row count). */
  constructor(expected: number) {
    let size = 16;
    while (size < expected * 2) size *= 2;
    this.slots = new Int32Array(size).fill(EMPTY);
    this.mask = size - 1;
  }

  /** The line that first had `key`; else records `line` as its first and returns undefined. */
  firstLineOr(key: string, line: number): number | undefined {
    if (this.fallback) return this.inMap(key, line);
    let slot = this.hash(key) & this.mask;
    for (let probes = 0; probes < MAX_PROBES; probes++) {
      const entry = this.slots[slot];
      if (entry === EMPTY) {
        this.slots[slot] = this.keys.length;
        this.keys.push(key);
        this.lines.push(line);
        return undefined;
      }
      if (this.keys[entry] === key) return this.lines[entry];
      slot = (slot + 1) & this.mask;
    }
    this.fallback = new Map();
    for (let i = 0; i < this.keys.length; i++) this.fallback.set(this.keys[i], this.lines[i]);
    return this.inMap(key, line);
  }

  private inMap(key: string, line: number): number | undefined {
    const first = this.fallback!.get(key);
    if (first === undefined) this.fallback!.set(key, line);
    return first;
  }

  /** FNV-1a over the UTF-16 code units from a random basis, then a finaliser that spreads the high bits down. */
  private hash(key: string): number {
    let h = this.seed ^ 0x811c9dc5;
    for (let i = 0; i < key.length; i++) {
      h ^= key.charCodeAt(i);
      h = Math.imul(h, 0x01000193);
    }
    h ^= h >>> 16;
    h = Math.imul(h, 0x85ebca6b);
    h ^= h >>> 13;
    return h >>> 0;
  }
}
