/**
 * `npm run reliability`: the fault, bad-input, concurrency, upload-abuse, session and
 * two-server suites (tests/reliability) and the browser test of the "Reconnecting…" notice,
 * then a summary table; the README's Reliability
 * section is rewritten with it (dated), with the last `npm run bench:load` figures when
 * there are any.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync, rmSync, mkdirSync } from 'node:fs';

const sections: { file: string; section: string }[] = [
  { file: 'database-down', section: '2. PostgreSQL stopped while requests arrive' },
  { file: 'reconnecting', section: '2. The client\'s "Reconnecting…" notice (Chromium)' },
  { file: 'interrupted-writes', section: '2. Import / bulk edit with its connection killed' },
  { file: 'mail-down', section: '2. Mail server down, mail queued' },
  { file: 'bad-input', section: '3. Generated bad input (every mutating route)' },
  { file: 'concurrency', section: '4. Lost updates and concurrent imports' },
  { file: 'upload-abuse', section: '5. Upload abuse' },
  { file: 'sessions', section: '6. Sessions and access' },
  { file: 'two-servers', section: '7. Two servers side by side' },
];

mkdirSync('.data', { recursive: true });
const report = '.data/reliability-report.json';
rmSync(report, { force: true });
const run = spawnSync('node_modules/.bin/vitest', ['run', 'tests/reliability', 'tests/browser/reconnecting.test.ts', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`], { encoding: 'utf8', env: { ...process.env, NODE_ENV: 'test' } });
process.stdout.write(run.stdout ?? '');
process.stderr.write(run.stderr ?? '');
if (!existsSync(report)) {
  console.error('vitest wrote no report');
  process.exit(1);
}
interface FileResult {
  name: string;
  startTime: number;
  endTime: number;
  assertionResults: { status: string; title: string }[];
}
const r = JSON.parse(readFileSync(report, 'utf8')) as { testResults: FileResult[] };
const cases = /\[bad input\] (\d+) generated requests; answers by status: (\{[^}]*\})/.exec(run.stdout ?? '');
const rows = sections.map((s) => {
  const f = r.testResults.find((x) => x.name.includes(`/${s.file}.test.ts`));
  const passed = f?.assertionResults.filter((a) => a.status === 'passed').length ?? 0;
  const failed = f ? f.assertionResults.length - passed : 0;
  const note = s.file === 'bad-input' && cases ? `${cases[1]} requests, statuses ${cases[2]}` : '';
  return { section: s.section, tests: f?.assertionResults.length ?? 0, passed, failed, seconds: f ? ((f.endTime - f.startTime) / 1000).toFixed(1) : '-', note };
});
const date = new Date().toISOString().slice(0, 10);
const table = [
  '| section | tests | passed | failed | time (s) | note |',
  '|---|---|---|---|---|---|',
  ...rows.map((x) => `| ${x.section} | ${x.tests} | ${x.passed} | ${x.failed} | ${x.seconds} | ${x.note} |`),
].join('\n');
console.log(`\nReliability, ${date}\n${table}`);

let load = '';
if (existsSync('.data/bench-load.json')) {
  const b = JSON.parse(readFileSync('.data/bench-load.json', 'utf8')) as {
    date: string;
    warmUp?: { seconds: number } | null;
    results: { run: number; seconds: number; connections: number; throughputPerSec: number; errors: number; serverRssMb: number; routes: { route: string; p50Ms: number; p99Ms: number; throughputPerSec: number; errors: number }[] }[];
  };
  // The target compares the first two runs (LOAD_RUNS may have made more).
  const [first, last] = [b.results[0], b.results[1]];
  const firstP99 = new Map(first.routes.map((x) => [x.route, x.p99Ms]));
  load = [
    '',
    `Load (\`npm run bench:load\`, ${b.date}: ${last.connections} connections, ${b.warmUp ? `a ${b.warmUp.seconds} s warm-up not counted` : 'no warm-up'}, then two runs of ${last.seconds} s; req/s and p50 of the second run):`,
    '',
    '| route | req/s | p50 (ms) | p99 run 1 (ms) | p99 run 2 (ms) | errors (both runs) |',
    '|---|---|---|---|---|---|',
    ...last.routes.map((x) => `| ${x.route} | ${x.throughputPerSec} | ${x.p50Ms} | ${firstP99.get(x.route)} | ${x.p99Ms} | ${[first, last].reduce((n, r) => n + (r.routes.find((y) => y.route === x.route)?.errors ?? 0), 0)} |`),
    '',
    `Total ${first.throughputPerSec} / ${last.throughputPerSec} req/s in run 1 / run 2, ${first.errors + last.errors} errors; server memory 10 s after run 1 / run 2: ${first.serverRssMb} MB / ${last.serverRssMb} MB.`,
  ].join('\n');
}
const readme = readFileSync('README.md', 'utf8');
const block = `<!-- reliability:start -->\nLast run ${date} (\`npm run reliability\`), on the project's 2-core machine:\n\n${table}\n${load}\n<!-- reliability:end -->`;
const next = readme.includes('<!-- reliability:start -->')
  ? readme.replace(/<!-- reliability:start -->[\s\S]*<!-- reliability:end -->/, block)
  : `${readme.trimEnd()}\n\n## Reliability\n\n${block}\n`;
writeFileSync('README.md', next);
const failed = rows.reduce((n, x) => n + x.failed, 0);
process.exit(run.status === 0 && failed === 0 ? 0 : 1);
