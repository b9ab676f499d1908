// Argument checks for programmer errors. Expected failures (no data, no fixed point) are values, not throws.

export function requireFinite(name: string, value: number): void {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a finite number, got ${value}`);
}

export function requirePositive(name: string, value: number): void {
  if (!(Number.isFinite(value) && value > 0)) throw new RangeError(`${name} must be > 0, got ${value}`);
}

export function requireNonNegative(name: string, value: number): void {
  if (!(Number.isFinite(value) && value >= 0)) throw new RangeError(`${name} must be >= 0, got ${value}`);
}
