import { ensureDependencies, runTs } from './lib/bootstrap.mjs';
ensureDependencies();
runTs('scripts/test.ts', process.argv.slice(2));
