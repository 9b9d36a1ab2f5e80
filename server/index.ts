import { loadConfig } from './config';
import { createDb } from './db/knex';
import { createApp } from './app';

/** Starts one stateless app server; several can run side by side on one database. */
const config = loadConfig();
const db = createDb(config.DATABASE_URL);
const { app, deps, close } = createApp({ db, config });

const server = app.listen(config.PORT, config.HOST, () => {
  deps.logger.info({ url: config.PUBLIC_URL, port: config.PORT }, 'Farthing is listening');
  process.send?.({ ready: true, port: config.PORT });
});

let stopping = false;
async function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  deps.logger.info({ signal }, 'stopping');
  server.close();
  server.closeAllConnections();
  await close().catch(() => undefined);
  await db.destroy().catch(() => undefined);
  process.exit(0);
}
process.on('SIGINT', () => void stop('SIGINT'));
process.on('SIGTERM', () => void stop('SIGTERM'));
// A lost database connection must never take the process down; requests answer 503 meanwhile.
process.on('unhandledRejection', (err) => deps.logger.error({ err }, 'unhandled rejection'));
