import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { ROOT } from '../infra/config.ts';
import { run, type Log } from '../infra/process.ts';

interface BuildStep {
  workspace: string;
  /** Folders and files whose change calls for a new build. */
  inputs: string[];
  output: string;
}

const STEPS: BuildStep[] = [
  {
    workspace: '@jigwright/core',
    inputs: ['packages/core/src', 'packages/core/tsconfig.json', 'packages/core/tsconfig.build.json'],
    output: 'packages/core/dist',
  },
  {
    workspace: '@jigwright/server',
    inputs: [
      'packages/server/src',
      'packages/server/tsconfig.json',
      'packages/server/tsconfig.build.json',
      'packages/core/src',
    ],
    output: 'packages/server/dist',
  },
  {
    workspace: '@jigwright/web',
    inputs: [
      'packages/web/src',
      'packages/web/index.html',
      'packages/web/public',
      'packages/web/vite.config.ts',
      'packages/core/src',
    ],
    output: 'packages/web/dist',
  },
];

function fingerprint(paths: string[]): string {
  const hash = createHash('sha256');
  hash.update(readFileSync(join(ROOT, 'package-lock.json')));
  const visit = (path: string) => {
    if (!existsSync(path)) return;
    const stat = statSync(path);
    if (stat.isDirectory()) {
      for (const entry of readdirSync(path).sort()) visit(join(path, entry));
    } else {
      hash.update(`${relative(ROOT, path)}:${stat.size}:${stat.mtimeMs}\n`);
    }
  };
  for (const path of paths) visit(join(ROOT, path));
  return hash.digest('hex');
}

/** Builds core, server and web in order, skipping a package whose inputs have not changed since its last build. */
export async function buildAll(stampDir: string, log: Log, only?: string[]): Promise<void> {
  mkdirSync(stampDir, { recursive: true });
  for (const step of STEPS.filter((s) => !only || only.includes(s.workspace))) {
    const stampFile = join(stampDir, `${step.workspace.replace(/\W+/g, '_')}.stamp`);
    const print = fingerprint(step.inputs);
    if (existsSync(join(ROOT, step.output)) && existsSync(stampFile) && readFileSync(stampFile, 'utf8') === print)
      continue;
    log(`Building ${step.workspace}…`);
    const started = Date.now();
    await run('npm', ['run', 'build', '-w', step.workspace], { cwd: ROOT });
    writeFileSync(stampFile, print);
    log(`Built ${step.workspace} in ${((Date.now() - started) / 1000).toFixed(1)} s`);
  }
}
