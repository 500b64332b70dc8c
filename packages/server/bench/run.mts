/**
 * `npm run bench` (packages/server): the library API on 10,000 generated plans against a bare
 * route of the same server, upload-to-parts time for a 5 MB drawing, the gzipped JavaScript of the
 * library page, and the query plans of the library's queries. Its own services and data under
 * .data/bench (settings BENCH_*, infra/config.ts); figures only, no pass or fail.
 */
import { mkdirSync, readdirSync, rmSync, statSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { loadSettings, ROOT } from '../../../infra/config.ts';
import { run, type Log } from '../../../infra/process.ts';
import { startStack, type Stack } from '../../../infra/stack.ts';
import { buildAll } from '../../../tools/build.ts';
import { migrateAndSeed, startServer, type RunningServer } from '../../../tools/server-process.ts';
import { generateLibrary } from './library-data.mts';
import { BARE_ROUTE, LIBRARY_QUERIES, load, type LoadFigures } from './library-load.mts';
import { QueryPlans, type ExplainedQuery } from './query-plans.mts';
import { signIn, uploadToParts } from './upload-timing.mts';
import { libraryPageWeight } from './web-weight.mts';

const log: Log = (message) => console.log(`[jigwright bench] ${message}`);

const { values: options } = parseArgs({
  options: {
    plans: { type: 'string', default: '10000' },
    connections: { type: 'string', default: '50' },
    seconds: { type: 'string', default: '10' },
    uploads: { type: 'string', default: '3' },
    /** Entities of the generated drawing: about 150 bytes each, so 34,000 make a 5 MB file. */
    entities: { type: 'string', default: '34000' },
  },
});
const count = (name: keyof typeof options) => {
  const value = Number(options[name]);
  if (!Number.isInteger(value) || value < 1) throw new Error(`--${name} must be a whole number above 0`);
  return value;
};

const load1 = () => loadavg()[0]!.toFixed(2);
const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
};

function table(rows: string[][]): string {
  const widths = rows[0]!.map((_, column) => Math.max(...rows.map((row) => row[column]!.length)));
  const line = (row: string[]) =>
    row
      .map((cell, column) => (column === 0 ? cell.padEnd(widths[column]!) : cell.padStart(widths[column]!)))
      .join('  ');
  return [line(rows[0]!), widths.map((width) => '─'.repeat(width)).join('  '), ...rows.slice(1).map(line)].join('\n');
}

async function main(): Promise<void> {
  const settings = loadSettings('bench');
  const plans = count('plans');
  const connections = count('connections');
  const seconds = count('seconds');
  const uploads = count('uploads');
  let stack: Stack | undefined;
  let server: RunningServer | undefined;
  const stopAll = async () => {
    await server?.stop();
    server = undefined;
    await stack?.stop();
    stack = undefined;
  };
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
    process.on(signal, () => void stopAll().then(() => process.exit(130)));
  }
  const loadAtStart = load1();

  try {
    // Every run from nothing but the build stamps: its own database, bucket and logs.
    mkdirSync(settings.dataDir, { recursive: true });
    for (const entry of readdirSync(settings.dataDir)) {
      if (entry !== 'build') rmSync(join(settings.dataDir, entry), { recursive: true, force: true });
    }
    // Side by side; a failed build must still leave a stack that started to be stopped.
    const [started, built] = await Promise.allSettled([
      startStack(settings, log),
      buildAll(join(settings.dataDir, 'build'), log),
    ]);
    if (started.status === 'fulfilled') stack = started.value;
    else throw started.reason;
    if (built.status === 'rejected') throw built.reason;
    const env = stack.serverEnv;
    await migrateAndSeed(env, log, { seed: false });

    log(`Generating ${plans} published plans…`);
    const library = await generateLibrary(
      {
        DB_HOST: env.DB_HOST!,
        DB_PORT: env.DB_PORT!,
        DB_NAME: env.DB_NAME!,
        DB_USER: env.DB_USER!,
        DB_PASSWORD: env.DB_PASSWORD!,
      },
      plans,
    );
    log(
      `${library.plans} plans, ${library.revisions} revisions, ${library.parts} parts in ${library.seconds.toFixed(1)} s`,
    );

    const dxf = join(settings.dataDir, 'parts-rack.dxf');
    await run('npx', ['tsx', 'tools/drawings/cli.ts', 'large', String(count('entities')), dxf], { cwd: ROOT });

    server = await startServer({ ...env, BENCH_BARE_ROUTE: 'true' }, join(settings.dataDir, 'logs/server.log'), log);
    const appUrl = settings.appUrl;

    log('Reading the query plans of the library requests…');
    const queryPlans = new QueryPlans(join(settings.dataDir, 'mariadb'), env.DB_NAME!);
    const explained = new Map<string, ExplainedQuery[]>();
    const totals = new Map<string, number>();
    for (const query of LIBRARY_QUERIES) {
      explained.set(
        query.name,
        await queryPlans.explain(plans, async () => {
          const response = await fetch(`${appUrl}${query.path}`);
          if (response.status !== 200) throw new Error(`${query.path} answered ${response.status}`);
          totals.set(query.name, ((await response.json()) as { total: number }).total);
        }),
      );
    }

    log(`Load: ${connections} connections, ${seconds} s each after a warm-up…`);
    const figures = new Map<string, LoadFigures>();
    for (const query of [BARE_ROUTE, ...LIBRARY_QUERIES]) {
      figures.set(
        query.name,
        await load(`${appUrl}${query.path}`, `${appUrl}/api/plans?pageSize=1`, connections, seconds),
      );
      log(`  ${query.name}: ${figures.get(query.name)!.requestsPerSecond.toFixed(0)} requests/s`);
    }

    log(`Uploading a ${(statSync(dxf).size / 1e6).toFixed(1)} MB drawing ${uploads} times…`);
    const cookies = await signIn(appUrl, settings.githubFakeUrl, `bench-uploader-${Date.now().toString(36)}`);
    const uploadSeconds: number[] = [];
    for (let i = 1; i <= uploads; i++) uploadSeconds.push(await uploadToParts(appUrl, cookies, dxf, i));

    const weight = libraryPageWeight(join(ROOT, 'packages/web/dist'));

    const bare = figures.get(BARE_ROUTE.name)!;
    const rows = [['request', 'matches', 'req/s', 'p50 ms', 'p99 ms', 'of bare', 'non-2xx', 'index use']];
    for (const query of [BARE_ROUTE, ...LIBRARY_QUERIES]) {
      const figure = figures.get(query.name)!;
      const scans = (explained.get(query.name) ?? []).flatMap((statement) => statement.scans);
      rows.push([
        query.name,
        totals.has(query.name) ? String(totals.get(query.name)) : '',
        figure.requestsPerSecond.toFixed(0),
        String(figure.p50),
        String(figure.p99),
        `${((figure.requestsPerSecond / bare.requestsPerSecond) * 100).toFixed(0)} %`,
        String(figure.non2xx + figure.errors),
        query === BARE_ROUTE ? '' : scans.length === 0 ? 'indexes only' : `SCANS ${scans.join('; ')}`,
      ]);
    }
    console.log('\n━━ Library API ━━');
    console.log(table(rows));
    console.log('\n━━ Query plans (EXPLAIN of each statement the server sent) ━━');
    for (const [name, statements] of explained) {
      console.log(`${name}:`);
      for (const statement of statements) {
        const tables = statement.tables.map(
          (t) => `${t.table} ${t.type} ${t.key} ~${t.rows}${t.extra ? ` (${t.extra})` : ''}`,
        );
        console.log(`  ${statement.sql.slice(0, 90)}…\n    ${tables.join('\n    ')}`);
      }
    }
    console.log('\n━━ Other figures ━━');
    console.log(
      table([
        ['figure', 'value'],
        [
          `upload-to-parts, ${(statSync(dxf).size / 1e6).toFixed(1)} MB drawing, median of ${uploads}`,
          `${median(uploadSeconds).toFixed(2)} s (${uploadSeconds.map((s) => s.toFixed(2)).join(', ')})`,
        ],
        [
          `library page JavaScript, gzipped (${weight.files.length} files)`,
          `${(weight.gzipped / 1024).toFixed(1)} kB (target ≤ 200 kB)`,
        ],
        ['three.js among them', weight.withThree.length === 0 ? 'no' : `YES: ${weight.withThree.join(', ')}`],
        ['generated data', `${library.plans} plans, ${library.parts} parts in ${library.seconds.toFixed(1)} s`],
        ['load average (1 min), start → end', `${loadAtStart} → ${load1()} on ${cpus().length} cores`],
      ]),
    );
  } finally {
    await stopAll();
  }
}

main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error(`[jigwright bench] ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    process.exit(1);
  },
);
