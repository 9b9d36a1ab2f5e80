/**
 * `npm test`: type-check, lint, then every vitest suite (unit, property, API against
 * the private test cluster, browser in Debian's Chromium). The last line counts every
 * test of every runner: `N passed, N failed[, N skipped]`.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { ensureChromium } from './lib/chromium';
import { ensureLibreOffice } from './lib/libreoffice';

interface Tally {
  passed: number;
  failed: number;
  skipped: number;
}
const tally: Tally = { passed: 0, failed: 0, skipped: 0 };
const say = (s: string) => console.log(`\n[test] ${s}`);

function step(name: string, cmd: string, args: string[]): boolean {
  say(name);
  const r = spawnSync(cmd, args, { stdio: 'inherit' });
  const ok = r.status === 0;
  if (ok) tally.passed++;
  else tally.failed++;
  console.log(`[test] ${name}: ${ok ? 'passed' : 'FAILED'}`);
  return ok;
}

function main() {
  mkdirSync('.data', { recursive: true });
  mkdirSync('test-artifacts', { recursive: true });
  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'test' };

  const chromium = ensureChromium((s) => say(s));
  if (chromium) env.FARTHING_CHROMIUM = chromium;
  else {
    console.log('\n' + '!'.repeat(78));
    console.log('!! BROWSER TESTS SKIPPED: Debian chromium is missing and cannot be installed');
    console.log('!! as this user. Install it with: sudo apt-get install -y chromium');
    console.log('!'.repeat(78));
  }

  const soffice = ensureLibreOffice((s) => say(s));
  if (soffice) env.FARTHING_SOFFICE = soffice;
  else {
    console.log('\n' + '!'.repeat(78));
    console.log('!! SPREADSHEET CHECK SKIPPED: LibreOffice Calc is missing and cannot be installed');
    console.log('!! as this user. Install it with: sudo apt-get install -y --no-install-recommends libreoffice-calc');
    console.log('!'.repeat(78));
  }

  step('type-check (tsc --noEmit)', 'node_modules/.bin/tsc', ['--noEmit', '-p', 'tsconfig.json']);
  step('lint (eslint)', 'node_modules/.bin/eslint', ['--max-warnings=0', 'src', 'server', 'tests', 'scripts', 'seeds', 'migrations', 'stripe-fake']);
  // The browser tests drive the built client.
  if (!step('client build (vite build)', 'node_modules/.bin/vite', ['build', '--logLevel', 'warn'])) delete env.FARTHING_CHROMIUM;

  say('vitest: unit, property, API and browser tests');
  const report = '.data/vitest-report.json';
  rmSync(report, { force: true });
  spawnSync('node_modules/.bin/vitest', ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`], {
    stdio: 'inherit',
    env,
  });
  if (existsSync(report)) {
    const r = JSON.parse(readFileSync(report, 'utf8')) as {
      numPassedTests: number;
      numFailedTests: number;
      numPendingTests: number;
      numTodoTests: number;
      numFailedTestSuites: number;
    };
    tally.passed += r.numPassedTests;
    tally.failed += r.numFailedTests + (r.numFailedTests === 0 ? r.numFailedTestSuites : 0);
    tally.skipped += r.numPendingTests + r.numTodoTests;
  } else {
    console.log('[test] vitest wrote no report: counting the run as one failure');
    tally.failed++;
  }

  const line = `${tally.passed} passed, ${tally.failed} failed${tally.skipped ? `, ${tally.skipped} skipped` : ''}`;
  console.log(`\n${line}`);
  process.exit(tally.failed > 0 ? 1 : 0);
}

main();
