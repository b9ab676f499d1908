-- Search (docs/search.md): a part-number key without separators, and a trigram full-text index
-- over what people type: part number, maker, package, kind and description.
-- The separator list and both expressions are mirrored by src/selection/query/search-text.ts;
-- tests/catalog/search/search-text-sql.test.ts holds the two together.

-- "KTR-1A1000-L", "ktr 1a1000 l" and "KTR1A1000L" share one key; indexed, a typed prefix is a range scan.
-- Generated, so it cannot go stale whoever writes the row.
ALTER TABLE part ADD COLUMN search_key TEXT GENERATED ALWAYS AS (
  upper(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(part_number, ' ', ''), char(9), ''), char(10), ''), char(13), ''), '-', ''), ',', ''), '.', ''), '/', ''), '_', ''), '(', ''), ')', ''), '#', ''), '+', ''), ':', ''), ';', ''), '''', ''), '"', ''), '±', ''), '%', ''), '&', ''), '*', ''), '[', ''), ']', ''))
) VIRTUAL;
CREATE INDEX part_search_key ON part (search_key);

-- The other fields squashed the same way, so "sod123" meets "SOD-123" and "lowleakage" meets "low leakage".
ALTER TABLE part ADD COLUMN search_text TEXT GENERATED ALWAYS AS (
  replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(manufacturer || ' ' || package || ' ' || kind || ' ' || description, ' ', ''), char(9), ''), char(10), ''), char(13), ''), '-', ''), ',', ''), '.', ''), '/', ''), '_', ''), '(', ''), ')', ''), '#', ''), '+', ''), ':', ''), ';', ''), '''', ''), '"', ''), '±', ''), '%', ''), '&', ''), '*', ''), '[', ''), ']', '')
) VIRTUAL;

-- The full-text index reads its text from part through this view and keeps no second copy.
CREATE VIEW part_search_source AS SELECT id, search_key AS key, search_text AS text FROM part;

CREATE VIRTUAL TABLE part_search USING fts5(
  key, text,
  content = 'part_search_source', content_rowid = 'id',
  tokenize = 'trigram'
);

-- While a large write is under way (src/catalog/search/bulk-index.ts) this holds the highest id
-- before it; rows above it are indexed in one statement when the write ends, in the same
-- transaction, so other connections never see it. Empty at every commit.
CREATE TABLE part_search_deferral (after_id INTEGER NOT NULL);

-- Triggers keep the index current whoever writes to part. An external-content index must be
-- given the old text to remove it. FTS5 flushes its pending terms at every statement savepoint,
-- which triggers open, so a row indexed here costs several times a row of the bulk statement.
CREATE TRIGGER part_search_ai AFTER INSERT ON part
WHEN NOT EXISTS (SELECT 1 FROM part_search_deferral d WHERE new.id > d.after_id) BEGIN
  INSERT INTO part_search (rowid, key, text) VALUES (new.id, new.search_key, new.search_text);
END;
CREATE TRIGGER part_search_ad AFTER DELETE ON part
WHEN NOT EXISTS (SELECT 1 FROM part_search_deferral d WHERE old.id > d.after_id) BEGIN
  INSERT INTO part_search (part_search, rowid, key, text) VALUES ('delete', old.id, old.search_key, old.search_text);
END;
CREATE TRIGGER part_search_au AFTER UPDATE OF part_number, manufacturer, package, kind, description ON part
WHEN NOT EXISTS (SELECT 1 FROM part_search_deferral d WHERE old.id > d.after_id) BEGIN
  INSERT INTO part_search (part_search, rowid, key, text) VALUES ('delete', old.id, old.search_key, old.search_text);
  INSERT INTO part_search (rowid, key, text) VALUES (new.id, new.search_key, new.search_text);
END;

-- Parts written before this migration.
INSERT INTO part_search (part_search) VALUES ('rebuild');
