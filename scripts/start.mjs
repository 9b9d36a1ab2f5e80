import { ensureDependencies, runTs } from './lib/bootstrap.mjs';
ensureDependencies();
runTs('scripts/start.ts', process.argv.slice(2));
