import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join, relative } from 'node:path';
import { loadSettings, ROOT } from '../infra/config.ts';
import { ensureDebianPackages } from '../infra/debian.ts';
import { runVisible, type Log } from '../infra/process.ts';
import { startStack, type Stack } from '../infra/stack.ts';
import { buildAll } from './build.ts';
import { migrateAndSeed, startServer, type RunningServer } from './server-process.ts';

const log: Log = (message) => console.log(`[jigwright test] ${message}`);

interface SuiteResult {
  name: string;
  passed: number;
  failed: number;
  skipped: number;
  seconds: number;
  note?: string;
}

interface JestLikeReport {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numTodoTests?: number;
  numRuntimeErrorTestSuites?: number;
  testResults?: Array<{ status?: string; message?: string }>;
}

interface PlaywrightReport {
  stats: { expected: number; unexpected: number; flaky: number; skipped: number };
  errors?: unknown[];
}

function readJson<T>(file: string): T | undefined {
  try {
    return JSON.parse(readFileSync(file, 'utf8')) as T;
  } catch {
    return undefined;
  }
}

/** Runs one suite with its output shown, then counts its tests from the JSON report it wrote. */
async function runSuite(
  name: string,
  command: string[],
  options: { cwd: string; env?: Record<string, string>; report: string; kind: 'jest' | 'playwright' },
): Promise<SuiteResult> {
  console.log(`\n━━ ${name} ━━`);
  rmSync(options.report, { force: true });
  const started = Date.now();
  const code = await runVisible(command[0]!, command.slice(1), {
    cwd: options.cwd,
    env: { ...process.env, ...options.env },
  });
  const seconds = (Date.now() - started) / 1000;
  if (options.kind === 'playwright') {
    const report = readJson<PlaywrightReport>(options.report);
    if (!report) return { name, passed: 0, failed: 1, skipped: 0, seconds, note: `no report (exit ${code})` };
    const failed = report.stats.unexpected + report.stats.flaky + (report.errors?.length ?? 0);
    return {
      name,
      passed: report.stats.expected,
      failed: failed || (code === 0 ? 0 : 1),
      skipped: report.stats.skipped,
      seconds,
    };
  }
  const report = readJson<JestLikeReport>(options.report);
  if (!report) return { name, passed: 0, failed: 1, skipped: 0, seconds, note: `no report (exit ${code})` };
  // A file that fails to load has no failed test, only a failed suite: count it, or it would pass unseen.
  const brokenFiles =
    report.numRuntimeErrorTestSuites ??
    report.testResults?.filter((file) => file.status === 'failed' && file.message).length ??
    0;
  const failed = report.numFailedTests + (report.numFailedTests === 0 ? brokenFiles : 0);
  return {
    name,
    passed: report.numPassedTests,
    failed: failed || (code === 0 ? 0 : 1),
    skipped: report.numPendingTests + (report.numTodoTests ?? 0),
    seconds,
  };
}

/** A check script that is not a test runner: one check, passed when it exits 0. */
async function runCheck(name: string, command: string[]): Promise<SuiteResult> {
  console.log(`\n━━ ${name} ━━`);
  const started = Date.now();
  const code = await runVisible(command[0]!, command.slice(1), { cwd: ROOT });
  const seconds = (Date.now() - started) / 1000;
  return { name, passed: code === 0 ? 1 : 0, failed: code === 0 ? 0 : 1, skipped: 0, seconds };
}

/**
 * `npm test -- --only server-e2e,browser --files plans` runs some suites, and within the Jest and
 * Playwright ones only the files matching the pattern; for working on one feature. CI runs them all.
 */
const SUITES = ['core', 'web', 'server-unit', 'server-e2e', 'demo-plans', 'browser'] as const;
type SuiteName = (typeof SUITES)[number];

function parseArguments(args: string[]): { only: Set<SuiteName>; files: string[] } {
  const only = new Set<SuiteName>(SUITES);
  const files: string[] = [];
  for (let i = 0; i < args.length; i += 1) {
    const [flag, inline] = args[i]!.split('=', 2);
    const value = inline ?? args[++i];
    if (flag === '--only' && value) {
      only.clear();
      for (const name of value.split(',')) {
        if (!(SUITES as readonly string[]).includes(name))
          throw new Error(`Unknown suite "${name}"; the suites are ${SUITES.join(', ')}`);
        only.add(name as SuiteName);
      }
    } else if (flag === '--files' && value) files.push(value);
    else throw new Error(`Unknown argument "${args[i]}"; use --only SUITE[,SUITE] and --files PATTERN`);
  }
  return { only, files };
}

async function main(): Promise<number> {
  const { only, files } = parseArguments(process.argv.slice(2));
  const settings = loadSettings('test');
  const reports = join(settings.dataDir, 'reports');
  let stack: Stack | undefined;
  let server: RunningServer | undefined;
  const results: SuiteResult[] = [];
  const stopAll = async () => {
    await server?.stop();
    server = undefined;
    await stack?.stop();
    stack = undefined;
  };
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
    process.on(signal, () => void stopAll().then(() => process.exit(130)));
  }

  try {
    // Every run starts from nothing: its own database, bucket and mail, never the demo data.
    rmSync(settings.dataDir, { recursive: true, force: true });
    mkdirSync(reports, { recursive: true });
    const chromium = await ensureDebianPackages('Chromium', ['/usr/bin/chromium'], ['chromium'], log);
    // Both settle before going on: a failed build must still stop the services that did start.
    const [stackStart, built] = await Promise.allSettled([
      startStack(settings, log),
      // The web app is built only for the browser tests; the other suites need core and the server.
      buildAll(
        join(settings.dataDir, 'build'),
        log,
        only.has('browser') ? undefined : ['@jigwright/core', '@jigwright/server'],
      ),
    ]);
    if (stackStart.status === 'fulfilled') stack = stackStart.value;
    if (stackStart.status === 'rejected') throw stackStart.reason;
    if (built.status === 'rejected') throw built.reason;
    stack = stackStart.value;
    const env = stack.serverEnv;

    // Vitest writes a Jest-shaped JSON report, read the same way.
    const vitest = (name: string, workspace: 'core' | 'web') =>
      runSuite(
        name,
        [
          'npx',
          'vitest',
          'run',
          '--reporter=default',
          '--reporter=json',
          `--outputFile.json=${join(reports, `${workspace}.json`)}`,
        ],
        { cwd: join(ROOT, 'packages', workspace), report: join(reports, `${workspace}.json`), kind: 'jest' },
      );
    if (only.has('core')) results.push(await vitest('core (vitest)', 'core'));
    if (only.has('web')) results.push(await vitest('web (vitest)', 'web'));
    if (only.has('server-unit'))
      results.push(
        await runSuite(
          'server unit (jest)',
          ['npx', 'jest', '--json', `--outputFile=${join(reports, 'server-unit.json')}`, ...files],
          {
            cwd: join(ROOT, 'packages/server'),
            report: join(reports, 'server-unit.json'),
            kind: 'jest',
          },
        ),
      );
    if (only.has('server-e2e'))
      results.push(
        await runSuite(
          'server e2e (jest + supertest, MariaDB)',
          [
            'npx',
            'jest',
            '--config',
            'test/jest-e2e.config.js',
            '--runInBand',
            '--json',
            `--outputFile=${join(reports, 'server-e2e.json')}`,
            ...files,
          ],
          {
            cwd: join(ROOT, 'packages/server'),
            // Their own database and bucket: nothing they leave behind reaches the browser tests.
            env: { ...env, DB_NAME: `${env.DB_NAME}_api`, S3_BUCKET: `${env.S3_BUCKET}-api` },
            report: join(reports, 'server-e2e.json'),
            kind: 'jest',
          },
        ),
      );

    if (only.has('demo-plans'))
      results.push(await runCheck('demo plans (drawings check)', ['npx', 'tsx', 'tools/drawings/check-demo-plans.ts']));

    const browserEnv = { ...env, WEB_DIST_DIR: join(ROOT, 'packages/web/dist') };
    if (only.has('browser')) {
      await migrateAndSeed(browserEnv, log);
      server = await startServer(browserEnv, join(settings.dataDir, 'logs/server.log'), log);
      results.push(
        await runSuite('browser (Playwright, Chromium)', ['npx', 'playwright', 'test', ...files], {
          cwd: join(ROOT, 'packages/e2e'),
          env: {
            E2E_BASE_URL: settings.appUrl,
            E2E_JSON_REPORT: join(reports, 'browser.json'),
            E2E_OUTPUT_DIR: join(settings.dataDir, 'browser-results'),
            E2E_MAIL_API: env.MAIL_INBOX_URL ?? '',
            CHROMIUM_PATH: chromium,
          },
          report: join(reports, 'browser.json'),
          kind: 'playwright',
        }),
      );
    }
  } catch (error) {
    log(error instanceof Error ? error.message : String(error));
    results.push({ name: 'set-up', passed: 0, failed: 1, skipped: 0, seconds: 0, note: 'the test set-up failed' });
  } finally {
    await stopAll();
  }

  console.log('\n━━ Summary ━━');
  for (const r of results) {
    console.log(
      `  ${r.name.padEnd(42)} ${r.passed} passed, ${r.failed} failed, ${r.skipped} skipped (${r.seconds.toFixed(1)} s)${r.note ? ` — ${r.note}` : ''}`,
    );
  }
  const total = results.reduce(
    (sum, r) => ({ passed: sum.passed + r.passed, failed: sum.failed + r.failed, skipped: sum.skipped + r.skipped }),
    {
      passed: 0,
      failed: 0,
      skipped: 0,
    },
  );
  const screenshots = join(settings.dataDir, 'browser-results');
  if (existsSync(screenshots)) console.log(`  Browser screenshots and traces: ${relative(ROOT, screenshots)}/`);
  console.log(`${total.passed} passed, ${total.failed} failed, ${total.skipped} skipped`);
  return total.failed > 0 ? 1 : 0;
}

main().then((code) => process.exit(code));
