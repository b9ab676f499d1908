import { closeSync, openSync, readSync } from 'node:fs';
import { RowCollector, type ReadSummary, type RowBatch } from './row-collector.js';

// 64 KiB: a string of this size is made in V8's young generation; from about 128 KiB to 1 MiB
// strings go to the large-object space and decoding costs seven times more (bench/README.md, import).
const CHUNK_BYTES = 1 << 16;

/**
 * Reads a CSV file 64 KiB at a time through the collector; `file` is the name issues carry.
 * Bytes are read as Latin-1 (one character each, several times quicker than UTF-8 decoding) and
 * the tokenizer decodes the few cells that need it; a record cut by the chunk's end is carried to
 * the next chunk as bytes, so every chunk is one flat string.
 */
export function readCsvFile(path: string, file: string, onBatch: (batch: RowBatch) => void, chunkBytes = CHUNK_BYTES, isCheckingIdentity = true): ReadSummary {
  const collector = new RowCollector(file, onBatch, 'latin1', isCheckingIdentity);
  let buffer = Buffer.allocUnsafe(chunkBytes);
  let carried = 0;
  let isFirst = true;
  const fd = openSync(path, 'r');
  try {
    for (;;) {
      if (buffer.length - carried < chunkBytes / 2) {
        // One record longer than the buffer: make room.
        const larger = Buffer.allocUnsafe(buffer.length * 2);
        buffer.copy(larger, 0, 0, carried);
        buffer = larger;
      }
      const read = readSync(fd, buffer, carried, buffer.length - carried, null);
      let from = 0;
      // The UTF-8 byte-order mark, as readFileSync(path, 'utf8') and csv-parse's bom option drop it.
      if (isFirst && carried + read >= 3 && buffer[0] === 0xef && buffer[1] === 0xbb && buffer[2] === 0xbf) from = 3;
      isFirst = false;
      const text = buffer.toString('latin1', from, carried + read);
      const consumed = collector.pushChunk(text, read === 0);
      if (read === 0 || consumed === undefined) break;
      carried = text.length - consumed;
      buffer.copy(buffer, 0, from + consumed, from + consumed + carried);
    }
  } finally {
    closeSync(fd);
  }
  return collector.end();
}

/** The same for text already in memory, a megabyte at a time so batches go out as they fill. */
export function readCsvText(text: string, file: string, onBatch: (batch: RowBatch) => void): ReadSummary {
  const collector = new RowCollector(file, onBatch);
  for (let at = 0; at < text.length; at += CHUNK_BYTES) collector.push(text.slice(at, at + CHUNK_BYTES));
  return collector.end();
}
