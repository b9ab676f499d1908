/**
 * A role's conditions schema, built on first use. The registry imports every role, and building
 * all nine zod schemas took a command that solves one position about 15 ms of its start-up
 * (bench/README.md, start-up).
 */
export function lazySchema<S>(build: () => S): () => S {
  let schema: S | undefined;
  return () => (schema ??= build());
}
