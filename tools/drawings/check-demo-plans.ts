/**
 * Checks the demo plans in plans-seed/ against themselves and the project's own analysis:
 *
 * - the drawings regenerate byte for byte from demo-plans.ts (into a temporary folder);
 * - every plan.json names only words from vocabulary.json, an owner from members.json or
 *   designers.json, revisions r1…rN in order with a changelog, and files that exist;
 * - every drawing on disk belongs to a revision, and every revision's drawing is generated;
 * - each drawing analyses without warnings or open paths, and its parts are exactly the parts in
 *   plan.json with the stated quantities;
 * - an indexing set is valid input for the calculator, and the step-table header attached beside
 *   it is the calculator's export of that set.
 *
 * Run from the repository root: npx tsx tools/drawings/check-demo-plans.ts
 */
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { analyzeDrawing } from '../../packages/core/src/analysis/analyze-drawing';
import type { DrawingAnalysis } from '../../packages/core/src/analysis/types';
import { jointCHeader } from '../../packages/core/src/indexing/export-c-header';
import { planJoint } from '../../packages/core/src/indexing/plan-joint';
import type { DemoPart, DemoPlanFile, DemoRevision } from '../../packages/server/src/seed/demo-plan-file';
import { DEMO_PLAN_DRAWINGS, demoDrawingPath } from './demo-plans';

// Run from the repository root, as npx runs it.
const SEED = path.resolve('plans-seed');
const PLANS = path.join(SEED, 'plans');

interface Vocabulary {
  categories: string[];
  tools: { id: string }[];
  licences: { id: string }[];
  stockKinds: string[];
  grain: string[];
}

const problems: string[] = [];
const report = (where: string, message: string) => problems.push(`${where}: ${message}`);

function readJson<T>(file: string): T {
  return JSON.parse(readFileSync(file, 'utf8')) as T;
}

function filesBelow(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? filesBelow(full) : [full];
  });
}

function checkRegeneration(): void {
  const out = mkdtempSync(path.join(tmpdir(), 'demo-plans-'));
  try {
    for (const drawing of DEMO_PLAN_DRAWINGS) {
      const relative = demoDrawingPath(drawing);
      const fresh = path.join(out, path.basename(relative));
      writeFileSync(fresh, drawing.draw());
      const committed = path.join(PLANS, relative);
      if (!existsSync(committed)) report(relative, 'generated but not committed');
      else if (!readFileSync(committed).equals(readFileSync(fresh)))
        report(relative, 'differs from what demo-plans.ts generates; run the demo-plans command');
    }
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
}

function checkDrawing(where: string, file: string, settings: readonly DemoPart[], vocabulary: Vocabulary): void {
  let analysis: DrawingAnalysis;
  try {
    analysis = analyzeDrawing(readFileSync(file, 'utf8'));
  } catch (error) {
    report(where, `the analysis refuses the drawing: ${error instanceof Error ? error.message : String(error)}`);
    return;
  }
  for (const warning of analysis.warnings) report(where, `analysis warning ${warning.code}: ${warning.message}`);
  if (analysis.openPaths > 0) report(where, `${analysis.openPaths} open paths`);
  const found = new Map<string, number>();
  for (const part of analysis.parts) {
    if (found.has(part.name)) report(where, `"${part.name}" comes out in two sizes (two rows)`);
    found.set(part.name, (found.get(part.name) ?? 0) + part.quantity);
  }
  for (const setting of settings) {
    const quantity = found.get(setting.name);
    if (quantity === undefined) report(where, `part "${setting.name}" is not on the drawing`);
    else if (quantity !== setting.quantity)
      report(where, `part "${setting.name}": drawing has ${quantity}, plan.json says ${setting.quantity}`);
    if (!vocabulary.stockKinds.includes(setting.stock))
      report(where, `"${setting.name}": unknown stock ${setting.stock}`);
    if (!vocabulary.grain.includes(setting.grain)) report(where, `"${setting.name}": unknown grain ${setting.grain}`);
    if (!(setting.thickness > 0)) report(where, `"${setting.name}": thickness must be positive`);
  }
  for (const name of found.keys())
    if (!settings.some((s) => s.name === name)) report(where, `part "${name}" has no settings in plan.json`);
}

function checkIndexing(where: string, dir: string, revision: DemoRevision): void {
  if (!revision.indexing) return;
  const outcome = planJoint(revision.indexing.inputs);
  if (!outcome.ok) {
    for (const error of outcome.errors) report(where, `indexing ${error.field}: ${error.message}`);
    return;
  }
  const header = jointCHeader(outcome.plan);
  const attached = revision.attachments?.find((a) => a.file.endsWith('.h'));
  if (!header.ok || !attached) report(where, 'an indexing set needs its step-table header attached');
  else if (readFileSync(path.join(dir, attached.file), 'utf8') !== header.text)
    report(where, `${attached.file} is not the calculator's header for the saved indexing set`);
}

function checkPlan(slug: string, vocabulary: Vocabulary, owners: ReadonlySet<string>, drawn: Set<string>): void {
  const dir = path.join(PLANS, slug);
  const plan = readJson<DemoPlanFile>(path.join(dir, 'plan.json'));
  if (plan.slug !== slug) report(slug, `plan.json says slug ${plan.slug}`);
  if (!owners.has(plan.owner)) report(slug, `owner ${plan.owner} is not a demo member or designer`);
  if (!vocabulary.categories.includes(plan.category)) report(slug, `unknown category ${plan.category}`);
  if (!vocabulary.licences.some((l) => l.id === plan.licence)) report(slug, `unknown licence ${plan.licence}`);
  for (const tool of plan.toolsNeeded)
    if (!vocabulary.tools.some((t) => t.id === tool)) report(slug, `unknown tool ${tool}`);
  if (!plan.title || !plan.summary || plan.tags.length === 0) report(slug, 'title, summary and tags are required');
  plan.revisions.forEach((revision, i) => {
    const where = `${slug} r${revision.number}`;
    if (revision.number !== i + 1) report(where, `revision ${i + 1} expected`);
    if (!revision.changelog.trim()) report(where, 'empty changelog');
    if (revision.hardware.length === 0) report(where, 'empty hardware list');
    const files = [revision.notes, revision.safety, ...(revision.attachments ?? []).map((a) => a.file)];
    for (const file of files) if (!existsSync(path.join(dir, file))) report(where, `missing ${file}`);
    for (const drawing of revision.drawings) {
      const relative = `${slug}/${drawing.file}`;
      if (!DEMO_PLAN_DRAWINGS.some((d) => demoDrawingPath(d) === relative))
        report(where, `${drawing.file} is not generated by demo-plans.ts`);
      else
        checkDrawing(
          `${where} ${path.basename(drawing.file)}`,
          path.join(dir, drawing.file),
          drawing.parts,
          vocabulary,
        );
      drawn.add(relative);
    }
    checkIndexing(where, dir, revision);
  });
}

function main(): number {
  const vocabulary = readJson<Vocabulary>(path.join(SEED, 'vocabulary.json'));
  const owners = new Set(
    ['members.json', 'designers.json'].flatMap((file) =>
      readJson<{ members: { login: string }[] }>(path.join(SEED, file)).members.map((m) => m.login),
    ),
  );
  checkRegeneration();
  const drawn = new Set<string>();
  const slugs = readdirSync(PLANS).filter((name) => statSync(path.join(PLANS, name)).isDirectory());
  for (const slug of slugs) checkPlan(slug, vocabulary, owners, drawn);
  for (const file of filesBelow(PLANS).filter((f) => f.endsWith('.dxf'))) {
    const relative = path.relative(PLANS, file).split(path.sep).join('/');
    if (!drawn.has(relative)) report(relative, 'no revision refers to this drawing');
  }
  for (const problem of problems) process.stderr.write(`${problem}\n`);
  process.stdout.write(
    `${slugs.length} plans, ${DEMO_PLAN_DRAWINGS.length} drawings: ${problems.length === 0 ? 'all checks pass' : `${problems.length} problems`}\n`,
  );
  return problems.length === 0 ? 0 : 1;
}

process.exit(main());
