import { fieldByKey } from '../../parts/index.js';
import type { NumberFilter, QueryFilter } from '../../selection/query/index.js';

/** A WHERE condition over `part p` and its parameters. */
export interface SqlCondition {
  readonly sql: string;
  readonly params: readonly unknown[];
}

// The datasheet's headline VF, the same point headlineVfV() picks in memory.
const HEADLINE_VF = `(SELECT j.value ->> 'vfV' FROM json_each(p.vf_points) j
  ORDER BY j.value ->> 'tjK', j.value ->> 'ifA' DESC LIMIT 1)`;

function numberCondition(f: NumberFilter): SqlCondition {
  const column = f.key === 'vfPoints' ? HEADLINE_VF : `p.${fieldByKey(f.key)!.column}`;
  const parts: string[] = [];
  const params: number[] = [];
  if (f.min !== undefined) {
    parts.push(`${column} ${f.isMinExclusive ? '>' : '>='} ?`);
    params.push(f.min);
  }
  if (f.max !== undefined) {
    parts.push(`${column} ${f.isMaxExclusive ? '<' : '<='} ?`);
    params.push(f.max);
  }
  return { sql: parts.join(' AND '), params };
}

const placeholders = (n: number) => Array.from({ length: n }, () => '?').join(', ');

/**
 * `makersMatching` turns a maker filter's text into the maker names that contain it: the
 * catalog holds few makers, and an IN list is cheaper than a LIKE over every row.
 */
function condition(f: QueryFilter, makersMatching: (text: string) => readonly string[]): SqlCondition {
  switch (f.type) {
    case 'number':
      return numberCondition(f);
    case 'kind':
    case 'approval':
    case 'lifecycle':
      return { sql: `p.${f.type} IN (${placeholders(f.values.length)})`, params: f.values };
    case 'package':
      return { sql: `p.package COLLATE NOCASE IN (${placeholders(f.values.length)})`, params: f.values };
    case 'group':
      return { sql: `p.second_source_group COLLATE NOCASE IN (${placeholders(f.values.length)})`, params: f.values };
    case 'maker': {
      // The names as stored (field-words.ts), so an exact comparison finds every spelling.
      const names = [...new Set(f.values.flatMap(makersMatching))];
      return names.length === 0 ? { sql: '0', params: [] } : { sql: `p.manufacturer IN (${placeholders(names.length)})`, params: names };
    }
  }
}

/** All filters joined with AND; a negated one keeps parts where it is false or cannot be told (NULL). */
export function filtersToSql(filters: readonly QueryFilter[], makersMatching: (text: string) => readonly string[]): SqlCondition {
  const sql: string[] = [];
  const params: unknown[] = [];
  for (const f of filters) {
    const c = condition(f, makersMatching);
    sql.push(f.isNegated ? `NOT coalesce((${c.sql}), 0)` : `(${c.sql})`);
    params.push(...c.params);
  }
  return { sql: sql.length > 0 ? sql.join(' AND ') : '1', params };
}
