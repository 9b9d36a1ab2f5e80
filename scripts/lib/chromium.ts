import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

/** Debian's Chromium for the browser tests: installed with apt-get when missing and root. */
export function ensureChromium(log: (s: string) => void): string | null {
  const path = '/usr/bin/chromium';
  if (existsSync(path)) return path;
  if (process.getuid?.() !== 0) return null;
  log('Installing Debian chromium for the browser tests (apt-get install chromium)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  const r = spawnSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit', env });
  return r.status === 0 && existsSync(path) ? path : null;
}
