import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { loadSettings, ROOT } from '../infra/config.ts';
import { waitForExit, type Log } from '../infra/process.ts';
import { startStack, type Stack } from '../infra/stack.ts';
import { buildAll } from './build.ts';
import { migrateAndSeed, startServer, tail, type RunningServer } from './server-process.ts';

const dev = process.argv.includes('--dev');
const log: Log = (message) => console.log(`[jigwright] ${message}`);
const started = Date.now();

interface DemoAccount {
  login: string;
  name: string;
  role: string;
}

function demoAccounts(): DemoAccount[] {
  return (JSON.parse(readFileSync(join(ROOT, 'plans-seed/members.json'), 'utf8')) as { members: DemoAccount[] })
    .members;
}

async function main(): Promise<void> {
  const settings = loadSettings('start');
  const webDevUrl = `http://${settings.get('APP_HOST')}:${settings.port('WEB_DEV_PORT')}`;
  const appUrl = dev && !settings.optional('PUBLIC_URL') ? webDevUrl : settings.appUrl;
  let stack: Stack | undefined;
  let server: RunningServer | undefined;
  const watchers: ChildProcess[] = [];
  let stopping = false;

  const stopAll = async (code: number) => {
    if (stopping) return;
    stopping = true;
    for (const watcher of watchers) {
      if (watcher.exitCode === null) {
        // Each watcher leads its own process group (npm exec and the tool it runs): stop the group.
        if (watcher.pid) process.kill(-watcher.pid, 'SIGTERM');
        await waitForExit(watcher, 5000);
      }
    }
    await server?.stop();
    await stack?.stop();
    log(code === 0 ? 'Stopped everything it started.' : 'Stopped.');
    process.exit(code);
  };
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
    process.on(signal, () => {
      console.log('');
      void stopAll(0);
    });
  }

  try {
    // Both settle before going on: a failed build must still stop the services that did start.
    const [stackStart, built] = await Promise.allSettled([
      startStack(settings, log, { extraOrigins: dev ? [webDevUrl] : [] }),
      buildAll(join(settings.dataDir, 'build'), log, dev ? ['@jigwright/core', '@jigwright/server'] : undefined),
    ]);
    if (stackStart.status === 'fulfilled') stack = stackStart.value;
    if (stackStart.status === 'rejected') throw stackStart.reason;
    if (built.status === 'rejected') throw built.reason;
    stack = stackStart.value;
    const env: Record<string, string> = {
      ...stack.serverEnv,
      PUBLIC_URL: appUrl,
      NODE_ENV: dev ? 'development' : 'production',
    };
    if (!dev) env.WEB_DIST_DIR ??= join(ROOT, 'packages/web/dist');
    await migrateAndSeed(env, log);

    if (dev) {
      for (const workspace of ['@jigwright/core', '@jigwright/server']) {
        watchers.push(
          spawn(
            'npm',
            ['exec', '-w', workspace, '--', 'tsc', '-p', 'tsconfig.build.json', '--watch', '--preserveWatchOutput'],
            {
              cwd: ROOT,
              stdio: ['ignore', 'ignore', 'inherit'],
              detached: true,
            },
          ),
        );
      }
    }
    const logFile = join(settings.dataDir, 'logs/server.log');
    server = await startServer(env, logFile, log, { watch: dev });
    server.child.once('exit', (code) => {
      if (stopping) return;
      log(`The server stopped unexpectedly (exit ${code}). Its last lines:\n${tail(logFile)}`);
      void stopAll(1);
    });
    if (dev) {
      const vite = spawn(
        'npm',
        [
          'exec',
          '-w',
          '@jigwright/web',
          '--',
          'vite',
          '--host',
          settings.get('APP_HOST'),
          '--port',
          String(settings.port('WEB_DEV_PORT')),
          '--strictPort',
        ],
        {
          cwd: ROOT,
          env: { ...process.env, JIGWRIGHT_API_URL: `http://${env.HOST}:${env.PORT}` },
          stdio: 'inherit',
          detached: true,
        },
      );
      vite.once('exit', (code) => {
        if (stopping) return;
        log(`Vite's dev server stopped (exit ${code}); see its message above.`);
        void stopAll(1);
      });
      watchers.push(vite);
    }

    const accounts = demoAccounts()
      .map((account) => `    ${account.login.padEnd(16)} ${account.name} (${account.role})`)
      .join('\n');
    console.log(`
Jigwright is running${dev ? ' in development mode (hot reload)' : ''} — ready in ${((Date.now() - started) / 1000).toFixed(1)} s

  App:           ${appUrl}
  API docs:      ${appUrl}/api/docs
  Mail inbox:    ${stack.serverEnv.MAIL_INBOX_URL ?? '(real SMTP relay configured)'}
  Server log:    ${logFile}

  Demo accounts (pick one on the sign-in page):
${accounts}

Press Ctrl-C to stop everything.
`);
  } catch (error) {
    log(error instanceof Error ? error.message : String(error));
    await stopAll(1);
  }
}

void main();
