/** Generated inputs per entry point: a sample in the normal run, 10,000 in `npm run test:fuzz`. */
export const FUZZ_RUNS = Number(process.env.HEADROOM_FUZZ_RUNS ?? 200);
/** Generous: a hang still fails, but 10,000 inputs on a 2-core machine take a while. */
export const FUZZ_TIMEOUT_MS = 600_000;
