-- A team's own derating policies, kept beside the parts. The built-in policies live in code.
CREATE TABLE derating_policy (
  id TEXT PRIMARY KEY,
  -- The policy as validated JSON (see src/circuits/derating.ts, deratingPolicySchema).
  body TEXT NOT NULL,
  updated_at TEXT NOT NULL,
  updated_by TEXT NOT NULL
);
