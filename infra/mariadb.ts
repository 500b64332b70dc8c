import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes, createHash } from 'node:crypto';
import { existsSync, mkdirSync, openSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ensureDebianPackages } from './debian.ts';
import { assertPortFree, isRunning, run, waitForExit, waitUntil, type Log } from './process.ts';

export interface MariaDbOptions {
  /** Private folder holding the data files, socket, pid file, log and the generated password. */
  dir: string;
  host: string;
  port: number;
  database: string;
  user: string;
  /** The test instance lets its user create and drop scratch databases. */
  grantAllDatabases?: boolean;
  log: Log;
}

export interface RunningMariaDb {
  password: string;
  errorLog: string;
  stop(): Promise<void>;
}

const SERVER_BINARIES = ['/usr/sbin/mariadbd', '/usr/bin/mariadbd'];

export function ensureMariaDbInstalled(log: Log): Promise<string> {
  return ensureDebianPackages('MariaDB server', SERVER_BINARIES, ['mariadb-server', 'mariadb-client'], log);
}

/** Unix sockets have a path limit of about 107 bytes; fall back to a short path in the temp folder. */
export function socketPath(dir: string): string {
  const inside = join(dir, 'mysqld.sock');
  if (inside.length < 100) return inside;
  return join(tmpdir(), `jigwright-${createHash('sha256').update(dir).digest('hex').slice(0, 12)}.sock`);
}

function readOrCreateSecret(path: string): string {
  if (existsSync(path)) return readFileSync(path, 'utf8').trim();
  const secret = randomBytes(18).toString('base64url');
  writeFileSync(path, `${secret}\n`, { mode: 0o600 });
  return secret;
}

function quote(value: string): string {
  return `'${value.replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;
}

export async function startMariaDb(options: MariaDbOptions): Promise<RunningMariaDb> {
  const { dir, host, port, database, user, log } = options;
  const server = await ensureMariaDbInstalled(log);
  const dataDir = join(dir, 'data');
  const socket = socketPath(dir);
  const pidFile = join(dir, 'mysqld.pid');
  const errorLog = join(dir, 'error.log');
  mkdirSync(dir, { recursive: true });
  const asRoot = process.getuid?.() === 0;
  const userArgs = asRoot ? ['--user=root'] : [];
  const admin = (args: string[]) => run('mariadb-admin', ['--no-defaults', `--socket=${socket}`, '-uroot', ...args]);

  await stopLeftover(pidFile, admin, log);

  if (!existsSync(join(dataDir, 'mysql'))) {
    log(`Creating the MariaDB data folder in ${dataDir}…`);
    await run('mariadb-install-db', [
      '--no-defaults',
      ...userArgs,
      `--datadir=${dataDir}`,
      '--auth-root-authentication-method=normal',
      '--skip-test-db',
    ]);
  }

  await assertPortFree(host, port, 'DB_PORT');
  const logFd = openSync(errorLog, 'a');
  const child: ChildProcess = spawn(
    server,
    [
      '--no-defaults',
      ...userArgs,
      `--datadir=${dataDir}`,
      `--bind-address=${host}`,
      `--port=${port}`,
      `--socket=${socket}`,
      `--pid-file=${pidFile}`,
      `--log-error=${errorLog}`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
    ],
    // Its own process group: Ctrl-C must not reach it; it is stopped with mariadb-admin shutdown.
    { stdio: ['ignore', logFd, logFd], detached: true },
  );
  let exited = false;
  child.once('exit', () => (exited = true));
  try {
    await waitUntil(
      'MariaDB',
      async () => {
        if (exited) throw new Error(`MariaDB stopped while starting; see ${errorLog}`);
        await admin(['ping']);
        return true;
      },
      30_000,
    );
  } catch (error) {
    if (!exited) child.kill('SIGTERM');
    throw new Error(`${(error as Error).message}\nMariaDB's log: ${errorLog}`, { cause: error });
  }

  const password = readOrCreateSecret(join(dir, 'app-password'));
  const grantTarget = options.grantAllDatabases ? '*.*' : `\`${database}\`.*`;
  const account = `${quote(user)}@'${host}'`;
  await run('mariadb', [
    '--no-defaults',
    `--socket=${socket}`,
    '-uroot',
    '-e',
    [
      `CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
      `CREATE USER IF NOT EXISTS ${account} IDENTIFIED BY ${quote(password)}`,
      `ALTER USER ${account} IDENTIFIED BY ${quote(password)}`,
      `GRANT ALL PRIVILEGES ON ${grantTarget} TO ${account}`,
      'FLUSH PRIVILEGES',
    ].join('; '),
  ]);

  return {
    password,
    errorLog,
    async stop() {
      if (exited) return;
      log('Stopping MariaDB…');
      await admin(['shutdown']).catch((error: Error) => log(`mariadb-admin shutdown failed: ${error.message}`));
      if (!(await waitForExit(child, 30_000))) {
        log(`MariaDB did not stop within 30 s; see ${errorLog}`);
      }
    },
  };
}

/** A server left running by a start that was killed: shut it down cleanly before starting ours. */
async function stopLeftover(pidFile: string, admin: (args: string[]) => Promise<string>, log: Log): Promise<void> {
  if (!existsSync(pidFile)) return;
  const pid = Number(readFileSync(pidFile, 'utf8').trim());
  if (!Number.isInteger(pid) || !isRunning(pid)) return;
  log(`Found MariaDB still running from an earlier start (pid ${pid}); shutting it down cleanly…`);
  await admin(['shutdown']).catch(() => undefined);
  await waitUntil('the earlier MariaDB to stop', async () => !isRunning(pid), 30_000);
}
