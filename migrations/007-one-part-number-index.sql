-- One B-tree where there were two. A million-part import builds every index of the part table
-- after its rows (bench/README.md, "Import"); part_identity alone took 2 s of it. Identity, the
-- part-number look-ups, typed prefixes, typo probes and the browser's paging order now all walk one
-- index that starts with the part-number key (search_key: the number squashed and in upper case).
-- Two part numbers that differ in letter case only have the same key, so the key leading changes
-- nothing about which parts are the same: still one part per maker and number, letter case ignored.
-- Readers name the key as well as the number (src/catalog/identity-sql.ts); the browser now lists
-- parts in key order, which ignores separators as well as letter case.

-- The triggers of migration 006 keep the key set; a row written without it by an older writer
-- gets it here before the unique index is built.
UPDATE part SET search_key = upper(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(replace(part_number, ' ', ''), char(9), ''), char(10), ''), char(13), ''), '-', ''), ',', ''), '.', ''), '/', ''), '_', ''), '(', ''), ')', ''), '#', ''), '+', ''), ':', ''), ';', ''), '''', ''), '"', ''), '±', ''), '%', ''), '&', ''), '*', ''), '[', ''), ']', '')) WHERE search_key IS NULL;

DROP INDEX part_identity;
DROP INDEX part_search_key;
CREATE UNIQUE INDEX part_key ON part (search_key, part_number COLLATE NOCASE, manufacturer COLLATE NOCASE);
