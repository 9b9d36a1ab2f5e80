import knex, { type Knex } from 'knex';
import pg from 'pg';

// Calendar dates stay 'YYYY-MM-DD' strings (no time-zone shift); numeric and bigint
// already arrive as strings, which keeps money exact and ids opaque.
pg.types.setTypeParser(1082, (v: string) => v);

export const camelToSnake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
// Column names are few and repeat on every row: each is converted once (a 10,000-line cost
// roll brings back some 800,000 values).
const camelNames = new Map<string, string>();
const snakeToCamel = (s: string) => {
  let out = camelNames.get(s);
  if (out === undefined) {
    out = s.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase());
    if (camelNames.size < 10_000) camelNames.set(s, out);
  }
  return out;
};

function camelizeRow(row: unknown): unknown {
  if (Array.isArray(row)) return camelizeRows(row);
  if (row && typeof row === 'object' && !(row instanceof Date) && !Buffer.isBuffer(row)) {
    const out: Record<string, unknown> = {};
    for (const k in row) out[snakeToCamel(k)] = (row as Record<string, unknown>)[k];
    return out;
  }
  return row;
}

/**
 * The rows of one result share their columns: the names are converted once per result
 * and each row copied by index (enumerating every row's keys was the largest single cost
 * of listing 1,000 lines). Rows already in camelCase are returned as they are.
 */
function camelizeRows(rows: unknown[]): unknown[] {
  const first = rows[0];
  if (!first || typeof first !== 'object' || Array.isArray(first) || first instanceof Date || Buffer.isBuffer(first)) return rows.map(camelizeRow);
  const keys = Object.keys(first);
  const names = keys.map(snakeToCamel);
  if (names.every((n, i) => n === keys[i])) return rows;
  const n = keys.length;
  return rows.map((row) => {
    const r = row as Record<string, unknown>;
    const out: Record<string, unknown> = {};
    for (let i = 0; i < n; i++) out[names[i]] = r[keys[i]];
    return out;
  });
}

/**
 * A select list that names each column in camelCase in SQL ("ref_des AS \"refDes\""), for
 * large reads: the rows then arrive as they are used, and are not copied to rename them.
 */
export function camelColumns(db: Knex | Knex.Transaction, columns: readonly string[]): Knex.Raw {
  return db.raw(columns.map((c) => (camelToSnake(c) === c ? c : `${camelToSnake(c)} AS "${c}"`)).join(', '));
}

/**
 * The one place where the database's snake_case meets the API's camelCase: identifiers
 * written in camelCase in query builders become snake_case, and result rows come back
 * camelCased (top level keys only; JSON columns keep their own keys).
 */
export function createDb(connectionString: string, overrides: Partial<Knex.Config> = {}): Knex {
  return knex({
    client: 'pg',
    // No JIT: it spends ~100 ms compiling for the cost roll's large reads and gains nothing
    // on queries this simple (common practice for OLTP work on PostgreSQL).
    connection: { connectionString, application_name: 'farthing', options: '-c jit=off' },
    pool: { min: 0, max: 10 },
    acquireConnectionTimeout: 5000,
    wrapIdentifier: (value, origImpl) => origImpl(value === '*' ? value : camelToSnake(value)),
    postProcessResponse: (result) => {
      if (Array.isArray(result)) return camelizeRows(result);
      if (result && typeof result === 'object' && 'rows' in result && Array.isArray(result.rows)) {
        // A raw query that names its columns in camelCase already ("partId") is left as it came.
        const rows = camelizeRows(result.rows);
        return rows === result.rows ? result : { ...result, rows };
      }
      return camelizeRow(result);
    },
    // A lost connection is reported to the client as a 503 by the error handler; knex's own
    // console line about it would only repeat that.
    log: {
      warn: (m: string) => (/Connection Error/.test(String(m)) ? undefined : console.warn(m)),
      error: (m: string) => console.error(m),
      deprecate: (m: string) => console.warn(m),
      debug: () => undefined,
    },
    ...overrides,
  });
}

export type Db = Knex;
export type Trx = Knex.Transaction;
export type DbOrTrx = Knex | Knex.Transaction;
