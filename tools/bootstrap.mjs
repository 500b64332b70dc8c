#!/usr/bin/env node
// The one plain-JavaScript file: it runs before any dependency is installed, so it cannot use
// TypeScript yet. It installs the npm dependencies when they are missing or stale, then hands over
// to the TypeScript tool named on the command line (tools/start.ts or tools/test.ts) through tsx.
import { spawnSync, spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const stamp = join(root, 'node_modules', '.jigwright-lock-hash');
const [tool, ...args] = process.argv.slice(2);

const [major, minor] = process.versions.node.split('.').map(Number);
if (major < 20 || (major === 20 && minor < 19)) {
  console.error(`Jigwright needs Node.js 20.19 or newer; this is ${process.version}.`);
  process.exit(1);
}

const lockHash = createHash('sha256')
  .update(readFileSync(join(root, 'package-lock.json')))
  .digest('hex');
const installed = existsSync(stamp) ? readFileSync(stamp, 'utf8').trim() : '';
if (installed !== lockHash) {
  console.log(
    existsSync(join(root, 'node_modules'))
      ? 'Dependencies changed: running npm ci…'
      : 'Installing dependencies (npm ci)…',
  );
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) {
    console.error('npm ci failed; see the messages above.');
    process.exit(result.status ?? 1);
  }
  writeFileSync(stamp, `${lockHash}\n`);
}

const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'tools', `${tool}.ts`), ...args], {
  cwd: root,
  stdio: 'inherit',
});
// The TypeScript tool handles Ctrl-C itself (it stops what it started); this process only waits for it.
for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) process.on(signal, () => child.kill(signal));
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
