import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { MessageChannel, Worker, receiveMessageOnPort, type MessagePort } from 'node:worker_threads';
import { packageRoot } from '../package-root.js';
import { FileIdentities } from './file-identities.js';
import { readCsvFile } from './read-csv-file.js';
import type { ReadSummary, RowBatch } from './row-collector.js';

/*
 * Feeds an import's rows to the writer. A large file is read in a worker thread while this thread
 * writes (two cores: reading and checking take about as long as writing, bench/README.md); a small
 * one is read here, which saves starting a thread. The import stays a synchronous call: this thread
 * sleeps on a shared counter until the worker posts, then takes the message directly from the port.
 */

export interface WorkerInput {
  readonly path: string;
  readonly file: string;
  /** Int32Array: [batches posted, batches taken]. */
  readonly signal: SharedArrayBuffer;
  /** Where the worker posts; this thread reads the other end synchronously. */
  readonly port: MessagePort;
  readonly maxInFlight: number;
}

export type FeedMessage =
  | { type: 'batch'; batch: RowBatch }
  | { type: 'done'; summary: ReadSummary }
  | { type: 'failed'; message: string };

// A worker starts in about a tenth of a second (its modules load); below this size reading here is quicker.
const WORKER_MIN_BYTES = 4 << 20;
const MAX_IN_FLIGHT = 6;

/**
 * The compiled worker, present when running from dist/ (tests on sources read in this thread):
 * its bundle when built (about half a second sooner to start than the modules), else the module.
 */
function workerScript(): string | undefined {
  const here = fileURLToPath(import.meta.url);
  if (!here.includes(`${join('dist')}`)) return undefined;
  const bundled = join(packageRoot(), 'dist', 'bundle', 'parse-worker.cjs');
  if (existsSync(bundled)) return bundled;
  const script = join(packageRoot(), 'dist', 'src', 'catalog', 'import', 'parse-worker.js');
  return existsSync(script) ? script : undefined;
}

export function feedCsvFile(path: string, file: string, onBatch: (batch: RowBatch) => void): ReadSummary {
  const script = statSync(path).size >= WORKER_MIN_BYTES ? workerScript() : undefined;
  return script ? feedFromWorker(script, path, file, onBatch) : readCsvFile(path, file, onBatch);
}

function feedFromWorker(script: string, path: string, file: string, onBatch: (batch: RowBatch) => void): ReadSummary {
  const signal = new SharedArrayBuffer(8);
  const counts = new Int32Array(signal);
  const { port1, port2 } = new MessageChannel();
  const input: WorkerInput = { path, file, signal, port: port2, maxInFlight: MAX_IN_FLIGHT };
  const worker = new Worker(script, { workerData: input, transferList: [port2] });
  // Reading bounds a large import; this thread waits for the worker otherwise (bench/README.md, import).
  const identities = new FileIdentities(file);
  const shapes: number[][] = [];
  try {
    for (;;) {
      const seen = Atomics.load(counts, 0);
      const received = receiveMessageOnPort(port1);
      if (!received) {
        Atomics.wait(counts, 0, seen, 1000);
        continue;
      }
      const message = received.message as FeedMessage;
      if (message.type === 'failed') throw new Error(`import worker failed: ${message.message}`);
      if (message.type === 'done') return { ...message.summary, fieldValues: identities.fieldValues() };
      Atomics.add(counts, 1, 1);
      Atomics.notify(counts, 1);
      shapes.push(...message.batch.newShapes);
      onBatch(identities.checkBatch(message.batch, shapes));
    }
  } finally {
    port1.close();
    void worker.terminate();
  }
}
