// Runs before dependencies exist, so plain JavaScript: installs them when missing,
// then hands over to the TypeScript script under tsx.
import { existsSync } from 'node:fs';
import { spawnSync, spawn } from 'node:child_process';

export function ensureDependencies() {
  if (existsSync('node_modules/.package-lock.json') && existsSync('node_modules/tsx')) return;
  console.log('Installing dependencies (npm ci)…');
  const r = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
}

export function runTs(script, args = []) {
  const child = spawn(process.execPath, ['--import', 'tsx', script, ...args], { stdio: 'inherit' });
  // Ctrl-C reaches the child through the terminal's process group; the parent only waits.
  for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => child.kill(sig));
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
}
