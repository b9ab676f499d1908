/**
 * Worker thread of a large import (row-feed.ts): reads and checks the file while the main thread
 * writes what it has already sent. Started by file path from dist/; it posts its batches and then a
 * summary, and waits while too many batches are unread so memory stays flat.
 */
import { workerData } from 'node:worker_threads';
import { readCsvFile } from './read-csv-file.js';
import type { FeedMessage, WorkerInput } from './row-feed.js';

const input = workerData as WorkerInput;
const signal = new Int32Array(input.signal);

function post(message: FeedMessage): void {
  input.port.postMessage(message);
  Atomics.add(signal, 0, 1);
  Atomics.notify(signal, 0);
}

try {
  const started = performance.now();
  let waitedMs = 0;
  // Rows are checked against each other on the writing thread (row-feed.ts), not here.
  const summary = readCsvFile(input.path, input.file, (batch) => {
    // signal[0] counts batches sent, signal[1] those the main thread took.
    const waitFrom = performance.now();
    while (Atomics.load(signal, 0) - Atomics.load(signal, 1) >= input.maxInFlight) Atomics.wait(signal, 1, Atomics.load(signal, 1), 1000);
    waitedMs += performance.now() - waitFrom;
    post({ type: 'batch', batch });
  }, undefined, false);
  post({ type: 'done', summary: { ...summary, readMs: performance.now() - started - waitedMs } });
} catch (error) {
  post({ type: 'failed', message: error instanceof Error ? (error.stack ?? error.message) : String(error) });
}
