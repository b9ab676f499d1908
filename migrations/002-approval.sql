-- The team's approval state and second-source groups, and an append-only trail of approval changes.
ALTER TABLE part ADD COLUMN approval TEXT NOT NULL DEFAULT 'pending';
ALTER TABLE part ADD COLUMN approval_note TEXT;
ALTER TABLE part ADD COLUMN second_source_group TEXT;
CREATE INDEX part_group ON part (second_source_group) WHERE second_source_group IS NOT NULL;

-- The trail names the part by identity, not by row id, so it outlives the part row.
CREATE TABLE approval_event (
  id INTEGER PRIMARY KEY,
  manufacturer TEXT NOT NULL,
  part_number TEXT NOT NULL,
  at TEXT NOT NULL,
  by TEXT NOT NULL,
  from_state TEXT,
  to_state TEXT NOT NULL,
  note TEXT,
  reason TEXT NOT NULL
);
CREATE INDEX approval_event_part ON approval_event (manufacturer COLLATE NOCASE, part_number COLLATE NOCASE, id);

CREATE TRIGGER approval_event_no_update BEFORE UPDATE ON approval_event
BEGIN
  SELECT RAISE(ABORT, 'approval history is append-only');
END;
CREATE TRIGGER approval_event_no_delete BEFORE DELETE ON approval_event
BEGIN
  SELECT RAISE(ABORT, 'approval history is append-only');
END;
