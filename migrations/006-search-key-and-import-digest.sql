-- Catalog-scale imports (bench/README.md, "Import"): every index here is built or extended by an
-- import of a million parts, so each one has to earn its place and be cheap to build.

-- 1. The two-column full-text index (part number and the other fields, 17 s to build at 1 M) and the
-- generated columns behind it. SQLite computes generated columns on every insert, needed or not:
-- search_text alone cost more than the rest of a row.
DROP TRIGGER part_search_ai;
DROP TRIGGER part_search_ad;
DROP TRIGGER part_search_au;
DROP TABLE part_search;
DROP VIEW part_search_source;
DROP INDEX part_search_key;
DROP INDEX part_identity;
DROP INDEX part_number_lookup;
ALTER TABLE part DROP COLUMN search_text;
ALTER TABLE part DROP COLUMN search_key;

-- 2. The part-number key as a plain column: Headroom's writers store searchKey(part_number)
-- (src/selection/query/search-text.ts), so a bulk import does not evaluate this expression per row;
-- the triggers below fill it in for writers that leave it out (plain SQL).
ALTER TABLE part ADD COLUMN search_key TEXT;
UPDATE part SET search_key = upper(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(part_number, ' ', ''), char(9), ''), char(10), ''), char(13), ''), '-', ''), ',', ''), '.', ''), '/', ''), '_', ''), '(', ''), ')', ''), '#', ''), '+', ''), ':', ''), ';', ''), '''', ''), '"', ''), '±', ''), '%', ''), '&', ''), '*', ''), '[', ''), ']', ''));

CREATE TRIGGER part_key_ai AFTER INSERT ON part WHEN new.search_key IS NULL BEGIN
  UPDATE part SET search_key = upper(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(new.part_number, ' ', ''), char(9), ''), char(10), ''), char(13), ''), '-', ''), ',', ''), '.', ''), '/', ''), '_', ''), '(', ''), ')', ''), '#', ''), '+', ''), ':', ''), ';', ''), '''', ''), '"', ''), '±', ''), '%', ''), '&', ''), '*', ''), '[', ''), ']', ''))
  WHERE id = new.id;
END;
-- A new part number with the key left as it was (the writer did not set it): compute it again.
CREATE TRIGGER part_key_au AFTER UPDATE OF part_number ON part
WHEN new.part_number IS NOT old.part_number AND new.search_key IS old.search_key BEGIN
  UPDATE part SET search_key = upper(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(new.part_number, ' ', ''), char(9), ''), char(10), ''), char(13), ''), '-', ''), ',', ''), '.', ''), '/', ''), '_', ''), '(', ''), ')', ''), '#', ''), '+', ''), ':', ''), ';', ''), '''', ''), '"', ''), '±', ''), '%', ''), '&', ''), '*', ''), '[', ''), ']', ''))
  WHERE id = new.id;
END;

-- 3. Two B-trees where there were three. Identity is the part number, then the maker, letter case
-- ignored: part-number lookups use its start, and the browser pages the catalog in this order. The
-- key index serves typed prefixes and the typo probes (docs/search.md).
CREATE UNIQUE INDEX part_identity ON part (part_number COLLATE NOCASE, manufacturer COLLATE NOCASE);
CREATE INDEX part_search_key ON part (search_key);

-- 4. Full text over the key alone. detail=none keeps no positions (half the build time), so a
-- word is looked up as all of its trigrams and the match confirmed against the key (candidate-queries.ts);
-- columnsize=0 keeps no per-row sizes, which only bm25 ranking would read.
CREATE VIEW part_search_source AS SELECT id, search_key AS key FROM part;
CREATE VIRTUAL TABLE part_search USING fts5(
  key,
  content = 'part_search_source', content_rowid = 'id',
  tokenize = 'trigram', detail = none, columnsize = 0
);
-- The index follows search_key; writes under a part_search_deferral (migration 004) are indexed at its end.
CREATE TRIGGER part_search_ai AFTER INSERT ON part
WHEN new.search_key IS NOT NULL AND NOT EXISTS (SELECT 1 FROM part_search_deferral d WHERE new.id > d.after_id) BEGIN
  INSERT INTO part_search (rowid, key) VALUES (new.id, new.search_key);
END;
CREATE TRIGGER part_search_ad AFTER DELETE ON part
WHEN old.search_key IS NOT NULL AND NOT EXISTS (SELECT 1 FROM part_search_deferral d WHERE old.id > d.after_id) BEGIN
  INSERT INTO part_search (part_search, rowid, key) VALUES ('delete', old.id, old.search_key);
END;
CREATE TRIGGER part_search_au AFTER UPDATE OF search_key ON part
WHEN NOT EXISTS (SELECT 1 FROM part_search_deferral d WHERE old.id > d.after_id) BEGIN
  INSERT INTO part_search (part_search, rowid, key) SELECT 'delete', old.id, old.search_key WHERE old.search_key IS NOT NULL;
  INSERT INTO part_search (rowid, key) SELECT new.id, new.search_key WHERE new.search_key IS NOT NULL;
END;
INSERT INTO part_search (part_search) VALUES ('rebuild');

-- 5. The words of the other searched fields, each distinct value once: a word is matched against
-- these few thousand values and the parts are found by value (src/catalog/search/field-words.ts).
-- Values no part holds any more are harmless: they find nothing.
CREATE TABLE part_field_value (
  field TEXT NOT NULL,
  value TEXT NOT NULL,
  PRIMARY KEY (field, value)
) WITHOUT ROWID;
INSERT INTO part_field_value (field, value)
  SELECT 'manufacturer', manufacturer FROM part UNION SELECT 'package', package FROM part
  UNION SELECT 'kind', kind FROM part UNION SELECT 'description', description FROM part;
CREATE TRIGGER part_field_value_ai AFTER INSERT ON part BEGIN
  INSERT OR IGNORE INTO part_field_value (field, value)
    VALUES ('manufacturer', new.manufacturer), ('package', new.package), ('kind', new.kind), ('description', new.description);
END;
CREATE TRIGGER part_field_value_au AFTER UPDATE OF manufacturer, package, kind, description ON part BEGIN
  INSERT OR IGNORE INTO part_field_value (field, value)
    VALUES ('manufacturer', new.manufacturer), ('package', new.package), ('kind', new.kind), ('description', new.description);
END;

-- 6. Import baselines (migration 003) move into the part row: one value per part instead of a
-- second table with its own identity index. Old baselines keep their SHA-256 text; new ones are a
-- cheaper number (src/catalog/import/row-digest.ts).
ALTER TABLE part ADD COLUMN import_digest;
UPDATE part SET import_digest = (
  SELECT b.row_digest FROM import_baseline b
  WHERE b.manufacturer = part.manufacturer COLLATE NOCASE AND b.part_number = part.part_number COLLATE NOCASE
);
DROP TABLE import_baseline;

-- 7. The approval trail of parts an import adds. Their entries carry the part's row id, indexed in
-- the order they are written (always increasing), instead of growing the identity index a million
-- times in random order. Entries without it (written before, or by other writers) are found by
-- identity as before; approvalHistory reads both. part_id only ever goes from a part to NULL, when
-- that part is deleted or renamed, so an entry is always found under the identity it names.
ALTER TABLE approval_event ADD COLUMN part_id INTEGER;
DROP INDEX approval_event_part;
CREATE INDEX approval_event_part ON approval_event (manufacturer COLLATE NOCASE, part_number COLLATE NOCASE, id) WHERE part_id IS NULL;
CREATE INDEX approval_event_part_id ON approval_event (part_id, id) WHERE part_id IS NOT NULL;
DROP TRIGGER approval_event_no_update;
CREATE TRIGGER approval_event_no_update BEFORE UPDATE OF id, manufacturer, part_number, at, by, from_state, to_state, note, reason ON approval_event
BEGIN
  SELECT RAISE(ABORT, 'approval history is append-only');
END;
CREATE TRIGGER approval_event_part_id_cleared BEFORE UPDATE OF part_id ON approval_event WHEN new.part_id IS NOT NULL
BEGIN
  SELECT RAISE(ABORT, 'an approval entry''s part_id can only be cleared');
END;
CREATE TRIGGER part_events_ad AFTER DELETE ON part BEGIN
  UPDATE approval_event SET part_id = NULL WHERE part_id = old.id;
END;
CREATE TRIGGER part_events_au AFTER UPDATE OF manufacturer, part_number ON part
WHEN new.manufacturer <> old.manufacturer COLLATE NOCASE OR new.part_number <> old.part_number COLLATE NOCASE BEGIN
  UPDATE approval_event SET part_id = NULL WHERE part_id = old.id;
END;
