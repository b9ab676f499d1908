/**
 * Known industry/JEDEC package names with the spellings engineers type.
 * Unknown names are kept as typed; known ones are stored under one canonical name
 * so that search, grouping and pin-out checks agree.
 */
export interface PackageInfo {
  readonly name: string;
  readonly aliases: readonly string[];
  readonly mount: 'surface' | 'through-hole';
  /** Terminals of a single diode in this package (SOT-23 single diodes use 3 pins, one unconnected). */
  readonly terminals: number;
}

export const KNOWN_PACKAGES: readonly PackageInfo[] = [
  { name: 'SOD-123', aliases: [], mount: 'surface', terminals: 2 },
  { name: 'SOD-123F', aliases: ['SOD-123FL'], mount: 'surface', terminals: 2 },
  { name: 'SOD-128', aliases: [], mount: 'surface', terminals: 2 },
  { name: 'SOD-323', aliases: ['SC-76'], mount: 'surface', terminals: 2 },
  { name: 'SOD-523', aliases: ['SC-79'], mount: 'surface', terminals: 2 },
  { name: 'SOD-80', aliases: ['MiniMELF', 'DO-213AA'], mount: 'surface', terminals: 2 },
  { name: 'MELF', aliases: ['DO-213AB'], mount: 'surface', terminals: 2 },
  { name: 'SOT-23', aliases: ['TO-236AB'], mount: 'surface', terminals: 3 },
  { name: 'SMA', aliases: ['DO-214AC'], mount: 'surface', terminals: 2 },
  { name: 'SMB', aliases: ['DO-214AA'], mount: 'surface', terminals: 2 },
  { name: 'SMC', aliases: ['DO-214AB'], mount: 'surface', terminals: 2 },
  { name: 'DO-35', aliases: ['DO-204AH'], mount: 'through-hole', terminals: 2 },
  { name: 'DO-41', aliases: ['DO-204AL'], mount: 'through-hole', terminals: 2 },
  { name: 'DO-15', aliases: ['DO-204AC'], mount: 'through-hole', terminals: 2 },
  { name: 'DO-201AD', aliases: [], mount: 'through-hole', terminals: 2 },
  { name: 'TO-220AC', aliases: [], mount: 'through-hole', terminals: 2 },
  { name: 'TO-220AB', aliases: [], mount: 'through-hole', terminals: 3 },
  { name: 'TO-247', aliases: ['TO-247AC'], mount: 'through-hole', terminals: 2 },
  { name: 'TO-252', aliases: ['DPAK'], mount: 'surface', terminals: 3 },
  { name: 'TO-263', aliases: ['D2PAK'], mount: 'surface', terminals: 3 },
];

/** Letters and digits only, upper case: "sod123", "SOD 123" and "SOD-123" all compare equal. */
export function packageKey(text: string): string {
  return text.toUpperCase().replace(/[^A-Z0-9]/g, '');
}

const BY_KEY = new Map<string, PackageInfo>();
for (const info of KNOWN_PACKAGES) {
  for (const spelling of [info.name, ...info.aliases]) BY_KEY.set(packageKey(spelling), info);
}

export function findPackage(text: string): PackageInfo | undefined {
  return BY_KEY.get(packageKey(text));
}

/** Canonical spelling of a known package, or the trimmed text as typed. */
export function normalisePackage(text: string): string {
  const trimmed = text.trim();
  return findPackage(trimmed)?.name ?? trimmed;
}
