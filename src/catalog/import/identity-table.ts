/**
 * The parts one import file has named so far, keyed by maker and part number with letter case
 * ignored as String.prototype.toLowerCase ignores it (identityOf in row-values.ts). The same as a
 * TextTable keyed by identityOf(…), without building that lower-case text for every row: the hash
 * folds ASCII letters as it reads (other text is lower-cased first, which is rare), and the texts
 * are compared only when hashes meet. A million rows arrive here on the writing thread of an import
 * (bench/README.md, import).
 */
export class IdentityTable {
  /** Pairs (hash, entry), entry -1 for an empty slot: one cache line answers most probes. */
  private slots = new Int32Array(2 << 10).fill(-1);
  private readonly makers: string[] = [];
  /** One copy of each maker's text: a file names a few dozen makers a million times. */
  private readonly makerTexts = new Map<string, string>();
  private readonly numbers: string[] = [];
  private readonly lines: number[] = [];

  /** The line that named this part before; if none, remembers `line` and returns undefined. */
  setIfAbsent(manufacturer: string, partNumber: string, line: number): number | undefined {
    const hash = mix(foldedHash(partNumber, foldedHash(manufacturer, 0x811c9dc5) ^ 0x9e3779b9));
    const mask = (this.slots.length >> 1) - 1;
    let slot = hash & mask;
    for (; ; slot = (slot + 1) & mask) {
      const at = this.slots[2 * slot + 1]!;
      if (at === -1) break;
      if (this.slots[2 * slot] === hash && sameFolded(this.makers[at]!, manufacturer) && sameFolded(this.numbers[at]!, partNumber)) return this.lines[at];
    }
    const at = this.lines.length;
    let maker = this.makerTexts.get(manufacturer);
    if (maker === undefined) {
      maker = manufacturer;
      if (this.makerTexts.size < 4096) this.makerTexts.set(maker, maker);
    }
    this.makers.push(maker);
    this.numbers.push(partNumber);
    this.lines.push(line);
    this.slots[2 * slot] = hash;
    this.slots[2 * slot + 1] = at;
    // Kept at most half full, so a probe seldom looks past its first slot.
    if (this.lines.length * 4 > this.slots.length) this.rehash();
    return undefined;
  }

  private rehash(): void {
    const old = this.slots;
    this.slots = new Int32Array(old.length * 2).fill(-1);
    const mask = (this.slots.length >> 1) - 1;
    for (let s = 0; s < old.length; s += 2) {
      if (old[s + 1] === -1) continue;
      let slot = old[s]! & mask;
      while (this.slots[2 * slot + 1] !== -1) slot = (slot + 1) & mask;
      this.slots[2 * slot] = old[s]!;
      this.slots[2 * slot + 1] = old[s + 1]!;
    }
  }
}

/** FNV-1a over the UTF-16 units of text.toLowerCase(), from `start`. */
function foldedHash(text: string, start: number): number {
  let h = start;
  for (let i = 0; i < text.length; i++) {
    let c = text.charCodeAt(i);
    if (c >= 0x80) return hashUnits(text.toLowerCase(), start);
    if (c >= 65 && c <= 90) c += 32;
    h = Math.imul(h ^ c, 0x01000193);
  }
  return h;
}

function hashUnits(text: string, h: number): number {
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  return h;
}

/** A final mix, so the low bits that pick a slot depend on every unit (common practice). */
function mix(h: number): number {
  h ^= h >>> 15;
  h = Math.imul(h, 0x2c1b3c6d);
  return h ^ (h >>> 12);
}

/** a.toLowerCase() === b.toLowerCase(), without the copies for equal or ASCII texts. */
function sameFolded(a: string, b: string): boolean {
  if (a === b) return true;
  if (a.length !== b.length) return a.toLowerCase() === b.toLowerCase();
  for (let i = 0; i < a.length; i++) {
    let x = a.charCodeAt(i);
    let y = b.charCodeAt(i);
    if (x === y) continue;
    if (x >= 0x80 || y >= 0x80) return a.toLowerCase() === b.toLowerCase();
    if (x >= 65 && x <= 90) x += 32;
    if (y >= 65 && y <= 90) y += 32;
    if (x !== y) return false;
  }
  return true;
}
