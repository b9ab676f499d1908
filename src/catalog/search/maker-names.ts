import type BetterSqlite3 from 'better-sqlite3';
import { squash } from '../../selection/query/index.js';

/**
 * The catalog's maker names, read again only after a write: this connection's own
 * (total_changes) or another's (data_version). A maker filter matches names containing its text.
 */
export function makerMatcher(db: BetterSqlite3.Database): (text: string) => readonly string[] {
  const names = db.prepare('SELECT DISTINCT manufacturer AS name FROM part').pluck();
  const version = db.prepare('SELECT total_changes() AS n').pluck();
  let stamp = '';
  let known: { name: string; squashed: string }[] = [];
  return (text) => {
    const now = `${db.pragma('data_version', { simple: true })}:${version.get()}`;
    if (now !== stamp) {
      known = (names.all() as string[]).map((name) => ({ name, squashed: squash(name).toLowerCase() }));
      stamp = now;
    }
    return known.filter((m) => m.squashed.includes(text)).map((m) => m.name);
  };
}
