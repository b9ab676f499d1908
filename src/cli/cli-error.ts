/** Exit codes: 0 success, 1 a check failed, 2 usage or input error. */
export const EXIT = { ok: 0, checkFailed: 1, usage: 2 } as const;

/** Bad arguments or bad input: exit 2, with what to do next. */
export class UsageError extends Error {
  constructor(
    message: string,
    readonly hint?: string,
    /** Extra lines (for example every bad row) printed after the message. */
    readonly details: readonly string[] = [],
    /** Data for --json output. */
    readonly data?: unknown,
  ) {
    super(message);
    this.name = 'UsageError';
  }
}
