import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, openSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { ROOT } from '../infra/config.ts';
import { run, waitForExit, waitUntil, type Log } from '../infra/process.ts';

const SERVER_DIST = join(ROOT, 'packages/server/dist');

/** Runs the pending migrations, then the idempotent demo seed, with the server's environment. */
export async function migrateAndSeed(env: Record<string, string>, log: Log, { seed = true } = {}): Promise<void> {
  const childEnv = { ...process.env, ...env, SEED_DIR: join(ROOT, 'plans-seed') };
  log((await run(process.execPath, [join(SERVER_DIST, 'database/migrate.js')], { env: childEnv, cwd: ROOT })).trim());
  if (seed)
    log((await run(process.execPath, [join(SERVER_DIST, 'seed/seed.js')], { env: childEnv, cwd: ROOT })).trim());
}

export interface RunningServer {
  child: ChildProcess;
  logFile: string;
  stop(): Promise<void>;
}

/**
 * Starts the NestJS server in its own process group (so that Ctrl-C reaches only the start command,
 * which then stops everything in order) and waits until /api/health answers.
 */
export async function startServer(
  env: Record<string, string>,
  logFile: string,
  log: Log,
  { watch = false } = {},
): Promise<RunningServer> {
  mkdirSync(dirname(logFile), { recursive: true });
  const out = openSync(logFile, 'a');
  const args = [...(watch ? ['--watch'] : []), join(SERVER_DIST, 'main.js')];
  const child = spawn(process.execPath, args, {
    env: { ...process.env, ...env },
    cwd: ROOT,
    stdio: ['ignore', out, out],
    detached: true,
  });
  const url = `http://${env.HOST}:${env.PORT}/api/health`;
  try {
    await waitUntil(
      'The server',
      async () => {
        if (child.exitCode !== null) throw new Error(`The server stopped while starting:\n${tail(logFile)}`);
        const response = await fetch(url);
        return response.status === 200;
      },
      60_000,
    );
  } catch (error) {
    child.kill('SIGTERM');
    throw error;
  }
  return {
    child,
    logFile,
    async stop() {
      if (child.exitCode !== null || child.signalCode !== null) return;
      log('Stopping the server…');
      child.kill('SIGTERM');
      if (!(await waitForExit(child, 10_000))) child.kill('SIGKILL');
    },
  };
}

export function tail(file: string, lines = 20): string {
  try {
    return readFileSync(file, 'utf8').trimEnd().split('\n').slice(-lines).join('\n');
  } catch {
    return '(no log)';
  }
}
