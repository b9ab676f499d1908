-- A team's own derating policies, kept beside the parts, and the import baselines of shared files.
CREATE TABLE derating_policy (
  id TEXT PRIMARY KEY,
  -- The policy as validated JSON (see src/circuits/derating.ts, deratingPolicySchema).
  body TEXT NOT NULL,
  updated_at TEXT NOT NULL,
  updated_by TEXT NOT NULL
);

-- What each part looked like when it last came in from a shared file, so that an import can tell
-- a part changed here since (a conflict to report) from one that is simply out of date.
CREATE TABLE import_baseline (
  manufacturer TEXT NOT NULL,
  part_number TEXT NOT NULL,
  row_digest TEXT NOT NULL,
  source TEXT NOT NULL,
  imported_at TEXT NOT NULL
);
CREATE UNIQUE INDEX import_baseline_identity ON import_baseline (manufacturer COLLATE NOCASE, part_number COLLATE NOCASE);
