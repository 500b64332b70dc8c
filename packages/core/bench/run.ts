// Benchmark of the drawing analysis and the sheet nesting (npm run bench -w @jigwright/core).
// Targets (issue 3): analysis ≤ 1.3 × dxf-parser's bare parseSync at 100k entities; peak memory
// ≤ 5 × file size + 100 MB; 500 parts nested on sheets in under 250 ms. Figures only, no pass/fail.
// The memory budget is compared with the peak RSS above the idle process (Node with tsx and our
// modules loaded, about 80 MB before any drawing is read): the budget is about what the analysis
// needs, not about the runtime. The absolute peak RSS and the peak heap above idle are shown too.
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, statSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import DxfParser from 'dxf-parser';
import { analyzeDrawing } from '../src/analysis/analyze-drawing';
import { layoutSheets } from '../src/nesting/guillotine-layout';

const repoRoot = path.resolve(__dirname, '../../..');
const tsx = path.join(repoRoot, 'node_modules/.bin/tsx');
const work = mkdtempSync(path.join(tmpdir(), 'jigwright-bench-'));

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] as number;
}

/** Median times of `first` and `second`, run in turn so that both see the same machine state. */
function timeInTurn(first: () => void, second: () => void, repeats: number): [number, number] {
  const times: [number[], number[]] = [[], []];
  for (let i = 0; i < repeats; i += 1) {
    [first, second].forEach((run, k) => {
      const started = performance.now();
      run();
      times[k]?.push(performance.now() - started);
    });
  }
  return [median(times[0]), median(times[1])];
}

function timeIt(run: () => void, repeats: number): number {
  return timeInTurn(run, () => undefined, repeats)[0];
}

function benchFile(label: string, file: string, repeats: number): void {
  const text = readFileSync(file, 'utf8');
  const bytes = statSync(file).size;
  // Parse and analysis in turn, so that both see the same load on the machine.
  const [parse, analysis] = timeInTurn(
    () => new DxfParser().parseSync(text),
    () => analyzeDrawing(text),
    repeats,
  );
  const memory = peakMemory(file);
  const budgetMb = (5 * bytes) / 1024 / 1024 + 100;
  console.log(
    `${label.padEnd(28)} ${(bytes / 1024 / 1024).toFixed(2).padStart(6)} MB  parse ${parse.toFixed(1).padStart(7)} ms  ` +
      `analysis ${analysis.toFixed(1).padStart(7)} ms  ratio ${(analysis / parse).toFixed(2)}  ` +
      `RSS ${memory.rssMb.toFixed(0)} MB, ${memory.rssAboveIdleMb.toFixed(0)} above idle (budget ${budgetMb.toFixed(0)} MB)  ` +
      `heap ${memory.heapAboveIdleMb.toFixed(0)} MB above idle`,
  );
}

/**
 * Peak memory of one analysis in a fresh process: the kernel's high-water mark of resident memory,
 * the same less the idle process (Node, tsx and our modules loaded, nothing read), and the
 * largest heap in use before a collection less the idle heap.
 */
function peakMemory(file: string): { rssMb: number; rssAboveIdleMb: number; heapAboveIdleMb: number } {
  const output = execFileSync(
    process.execPath,
    ['--trace-gc', '--import', 'tsx', path.join(__dirname, 'analyze-once.ts'), file],
    {
      encoding: 'utf8',
      maxBuffer: 64 * 1024 * 1024,
    },
  );
  // The GC trace goes on after the result line, as the process exits.
  const line = output.slice(output.lastIndexOf('RESULT ') + 7);
  const result = JSON.parse(line.slice(0, line.indexOf('\n'))) as {
    maxRssKb: number;
    idleRssKb: number;
    idleHeapKb: number;
  };
  let peakHeapMb = 0;
  for (const match of output.matchAll(/ ([\d.]+) \([\d.]+\) -> [\d.]+ \([\d.]+\) MB/g))
    peakHeapMb = Math.max(peakHeapMb, Number(match[1]));
  return {
    rssMb: result.maxRssKb / 1024,
    rssAboveIdleMb: (result.maxRssKb - result.idleRssKb) / 1024,
    heapAboveIdleMb: peakHeapMb - result.idleHeapKb / 1024,
  };
}

// Timings on a shared machine move with its load: the load averages go with the figures.
const load = (): string =>
  loadavg()
    .map((value) => value.toFixed(2))
    .join(', ');
console.log(`load average ${load()}`);
console.log('drawing analysis against dxf-parser parseSync (median of runs)');
for (const entities of [1_000, 10_000, 100_000]) {
  const file = path.join(work, `large-${entities}.dxf`);
  execFileSync(tsx, [path.join(repoRoot, 'tools/drawings/cli.ts'), 'large', String(entities), file]);
  benchFile(`generated ${entities} entities`, file, entities >= 100_000 ? 5 : 9);
}
const largestReference = path.resolve(repoRoot, '../shared/reference-data/dxf/dxf/floorplan.dxf');
if (existsSync(largestReference)) benchFile('reference floorplan.dxf', largestReference, 9);
else console.log('reference floorplan.dxf: skipped, ../shared/reference-data is absent');

// 500 parts of a jig-sized mix on 2440 × 1220 sheets, 3.2 mm kerf, 10 mm trim; sizes from a fixed
// linear congruential sequence so that every run nests the same parts.
let seed = 12345;
const next = (): number => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648;
};
const parts = Array.from({ length: 500 }, (_, i) => ({
  name: `part ${i}`,
  length: Math.round(80 + next() * 700),
  width: Math.round(40 + next() * 300),
  grain: next() < 0.5 ? ('length' as const) : ('any' as const),
}));
let sheets = 0;
const nesting = timeIt(() => {
  sheets = layoutSheets(parts, { kerf: 3.2, edgeTrim: 10 }).sheets.length;
}, 7);
const bound = layoutSheets(parts, { kerf: 3.2, edgeTrim: 10 }).lowerBound;
console.log(`nesting 500 parts on sheets: ${nesting.toFixed(1)} ms, ${sheets} sheets (area lower bound ${bound})`);
console.log(`load average ${load()}`);
