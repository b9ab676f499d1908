/**
 * A table keyed by text for the reading side of an import, where every row brings fresh strings:
 * hashing and probing those in a Map or Set cost about a microsecond each on the benchmark machine,
 * mostly cache misses in a table that outgrows the processor's caches. Here the slots are typed
 * arrays keyed by a 32-bit hash of our own, and texts are compared only when hashes meet.
 */
export class TextTable<V> {
  private slots = new Int32Array(1 << 10).fill(-1);
  private hashes = new Int32Array(1 << 9);
  private readonly texts: string[] = [];
  private readonly values: V[] = [];

  get size(): number {
    return this.texts.length;
  }

  get(text: string): V | undefined {
    const hash = hashOf(text);
    const mask = this.slots.length - 1;
    for (let slot = hash & mask; ; slot = (slot + 1) & mask) {
      const at = this.slots[slot]!;
      if (at === -1) return undefined;
      if (this.hashes[at] === hash && this.texts[at] === text) return this.values[at];
    }
  }

  /** The value stored under `text`; if none, stores `value` and returns undefined. */
  setIfAbsent(text: string, value: V): V | undefined {
    const hash = hashOf(text);
    const mask = this.slots.length - 1;
    let slot = hash & mask;
    for (; ; slot = (slot + 1) & mask) {
      const at = this.slots[slot]!;
      if (at === -1) break;
      if (this.hashes[at] === hash && this.texts[at] === text) return this.values[at];
    }
    const at = this.texts.length;
    if (at === this.hashes.length) {
      const hashes = new Int32Array(at * 2);
      hashes.set(this.hashes);
      this.hashes = hashes;
    }
    this.texts.push(text);
    this.values.push(value);
    this.hashes[at] = hash;
    this.slots[slot] = at;
    // Kept at most half full, so a probe seldom looks past its first slot.
    if (this.texts.length * 2 > this.slots.length) this.rehash();
    return undefined;
  }

  keys(): readonly string[] {
    return this.texts;
  }

  private rehash(): void {
    this.slots = new Int32Array(this.slots.length * 2).fill(-1);
    const mask = this.slots.length - 1;
    for (let at = 0; at < this.texts.length; at++) {
      let slot = this.hashes[at]! & mask;
      while (this.slots[slot] !== -1) slot = (slot + 1) & mask;
      this.slots[slot] = at;
    }
  }
}

/** FNV-1a over UTF-16 units with a final mix (common practice). */
function hashOf(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  h ^= h >>> 15;
  h = Math.imul(h, 0x2c1b3c6d);
  return h ^ (h >>> 12);
}
