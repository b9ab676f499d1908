import { readJsonRecords } from '../json-format.js';
import { RowCollector, type ReadSummary, type RowBatch } from './row-collector.js';

/** The JSON format through the same checks and writer as CSV (records decoded by the reference). */
export function readJsonText(text: string, file: string, onBatch: (batch: RowBatch) => void): ReadSummary {
  const read = readJsonRecords(file, text);
  const collector = new RowCollector(file, onBatch, 'records');
  collector.addIssues(read.issues, read.isUnreadable === true);
  for (const record of read.records) collector.addRecord(record.cells, record.line);
  return collector.end();
}
