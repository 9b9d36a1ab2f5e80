import knex, { type Knex } from 'knex';
import pg from 'pg';

// Calendar dates stay 'YYYY-MM-DD' strings (no time-zone shift); numeric and bigint
// already arrive as strings, which keeps money exact and ids opaque.
pg.types.setTypeParser(1082, (v: string) => v);

const camelToSnake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
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
  if (Array.isArray(row)) return row.map(camelizeRow);
  if (row && typeof row === 'object' && !(row instanceof Date) && !Buffer.isBuffer(row)) {
    const out: Record<string, unknown> = {};
    for (const k in row) out[snakeToCamel(k)] = (row as Record<string, unknown>)[k];
    return out;
  }
  return row;
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
      if (Array.isArray(result)) return result.map(camelizeRow);
      if (result && typeof result === 'object' && 'rows' in result && Array.isArray(result.rows)) {
        // A raw query that names its columns in camelCase already ("partId") is left as it came.
        const first = result.rows[0] as Record<string, unknown> | undefined;
        if (first && typeof first === 'object' && Object.keys(first).every((k) => snakeToCamel(k) === k)) return result;
        return { ...result, rows: result.rows.map(camelizeRow) };
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
