/** Why a catalog file could not be used. The CLI maps every code to a message and exit code 2. */
export type CatalogErrorCode =
  | 'not-found'
  | 'not-sqlite'
  | 'foreign'
  | 'too-new'
  | 'damaged'
  | 'unknown-part'
  | 'ambiguous-part'
  | 'invalid-change'
  | 'unknown-group'
  | 'busy';

export class CatalogError extends Error {
  constructor(
    readonly code: CatalogErrorCode,
    message: string,
    /** What the user can do next. */
    readonly hint?: string,
  ) {
    super(message);
    this.name = 'CatalogError';
  }
}
