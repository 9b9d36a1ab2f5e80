import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';

/** LibreOffice Calc recalculates the exported workbook in tests; installed with apt-get when missing and root. */
export function ensureLibreOffice(log: (s: string) => void): string | null {
  const path = '/usr/bin/soffice';
  if (existsSync(path)) return path;
  if (process.getuid?.() !== 0) return null;
  log('Installing LibreOffice Calc for the workbook check (apt-get install libreoffice-calc)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  const r = spawnSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', 'libreoffice-calc'], { stdio: 'inherit', env });
  return r.status === 0 && existsSync(path) ? path : null;
}
