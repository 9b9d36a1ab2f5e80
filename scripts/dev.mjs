import { ensureDependencies, runTs } from './lib/bootstrap.mjs';
ensureDependencies();
runTs('scripts/start.ts', ['--dev', ...process.argv.slice(2)]);
