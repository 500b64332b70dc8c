import type { INestApplicationContext } from '@nestjs/common';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import type { Actor } from '../common/ownership';
import { MembersService } from '../members/members.service';
import type { CreatePlanDto } from '../plans/dto/plan.dto';
import type { UpdatePartDto } from '../plans/dto/revision.dto';
import { PlansService } from '../plans/plans.service';
import { RevisionsService } from '../plans/revisions.service';
import { UploadsService, type ReceivedFile } from '../plans/uploads.service';
import type { DemoPlanFile, DemoRevision } from './demo-plan-file';
import {
  categoryId,
  GRAIN_RULES,
  LICENCES,
  STOCK_KINDS,
  TOOLS,
  type GrainRule,
  type Licence,
  type StockKind,
  type Tool,
} from '../plans/vocabulary';

function oneOf<T extends string>(list: readonly T[], value: string, what: string): T {
  const found = list.find((item) => item === value);
  if (!found) throw new Error(`${what} "${value}" is not in the vocabulary`);
  return found;
}

function detailsOf(file: DemoPlanFile): CreatePlanDto {
  const category = categoryId(file.category);
  if (!category) throw new Error(`${file.slug}: category "${file.category}" is not in the vocabulary`);
  return {
    title: file.title,
    summary: file.summary,
    category,
    tags: file.tags,
    toolsNeeded: file.toolsNeeded.map((tool) => oneOf<Tool>(TOOLS, tool, `${file.slug}: tool`)),
    licence: oneOf<Licence>(LICENCES, file.licence, `${file.slug}: licence`),
    motorised: file.motorised,
  };
}

function fileAt(path: string, name = basename(path)): ReceivedFile {
  const buffer = readFileSync(path);
  return { originalname: name, size: buffer.length, buffer };
}

/**
 * Loads the demo plans as the product would have made them: the owner creates the plan, each
 * revision starts as a copy of the one before, gets its text and files, has its parts set and is
 * submitted; then it is published with its date. Matched by slug and revision number: a published
 * revision is left alone, one left unfinished by an interrupted run is finished.
 */
export async function seedDemoPlans(app: INestApplicationContext, seedDir: string): Promise<void> {
  const plansDir = join(seedDir, 'plans');
  if (!existsSync(plansDir)) return;
  for (const slug of readdirSync(plansDir).sort()) {
    const planFile = join(plansDir, slug, 'plan.json');
    if (existsSync(planFile))
      await seedPlan(app, join(plansDir, slug), JSON.parse(readFileSync(planFile, 'utf8')) as DemoPlanFile);
  }
}

async function seedPlan(app: INestApplicationContext, folder: string, file: DemoPlanFile): Promise<void> {
  const plans = app.get(PlansService);
  const revisions = app.get(RevisionsService);
  const owner = await app.get(MembersService).getByLogin(file.owner);
  const actor: Actor = { memberId: owner.id, role: owner.role };
  const found = await plans.findBySlug(file.slug);
  if (found && found.ownerId !== owner.id) {
    // A member's own plan took the slug first: theirs stays, the demo plan is left out.
    process.stderr.write(`Demo plan ${file.slug} skipped: that slug belongs to another member's plan.\n`);
    return;
  }
  const plan = found ?? (await plans.create(actor, detailsOf(file), { slug: file.slug }));
  for (const demo of file.revisions) {
    const existing = (await plans.revisionsFor(actor, plan)).find((revision) => revision.number === demo.number);
    if (existing?.state === 'published') continue;
    if (!existing) {
      const started = await revisions.startNew(actor, file.slug);
      if (started.revision.number !== demo.number) {
        throw new Error(
          `${file.slug}: r${demo.number} would be r${started.revision.number}; the revisions are not in order`,
        );
      }
    }
    await seedRevision(app, actor, folder, file.slug, demo);
  }
}

async function seedRevision(
  app: INestApplicationContext,
  actor: Actor,
  folder: string,
  slug: string,
  demo: DemoRevision,
): Promise<void> {
  const revisions = app.get(RevisionsService);
  const uploads = app.get(UploadsService);
  const number = demo.number;
  let { revision } = await revisions.getReadable(actor, slug, number);
  if (revision.state === 'submitted') ({ revision } = await revisions.withdraw(actor, slug, number));

  ({ revision } = await revisions.updateDraft(actor, slug, number, {
    expectedUpdatedAt: revision.updatedAt.toISOString(),
    changelog: demo.changelog,
    notes: readFileSync(join(folder, demo.notes), 'utf8'),
    safetyNotes: readFileSync(join(folder, demo.safety), 'utf8'),
    hardware: demo.hardware,
    indexing: demo.indexing ?? null,
  }));

  // The copy of the revision before brought its files; keep those this revision has too, by content.
  const wanted = {
    drawings: demo.drawings.map((drawing) => fileAt(join(folder, drawing.file))),
    attachments: (demo.attachments ?? []).map((attachment) => fileAt(join(folder, attachment.file), attachment.name)),
  };
  const contents = await revisions.contentsOf(revision.id);
  const shaOf = (received: ReceivedFile) => uploads.sha256Of(received.buffer);
  for (const drawing of contents.drawings) {
    if (!wanted.drawings.some((received) => shaOf(received) === drawing.sha256)) {
      await uploads.deleteDrawing(actor, slug, number, drawing.id);
    }
  }
  for (const attachment of contents.attachments) {
    if (!wanted.attachments.some((received) => shaOf(received) === attachment.sha256)) {
      await uploads.deleteAttachment(actor, slug, number, attachment.id);
    }
  }
  for (const received of wanted.drawings) {
    if (contents.drawings.some((drawing) => drawing.sha256 === shaOf(received))) continue;
    await (
      await uploads.uploadDrawing(actor, slug, number, received)
    ).analysed;
  }
  for (const [i, received] of wanted.attachments.entries()) {
    if (contents.attachments.some((attachment) => attachment.sha256 === shaOf(received))) continue;
    await uploads.uploadAttachment(actor, slug, number, received, demo.attachments![i]!.description);
  }

  const settled = await revisions.contentsOf(revision.id);
  const failed = settled.drawings.find((drawing) => drawing.status !== 'done');
  if (failed)
    throw new Error(`${slug} r${number}: ${failed.originalName} was not analysed: ${failed.error ?? failed.status}`);
  for (const [i, drawing] of demo.drawings.entries()) {
    const stored = settled.drawings.find((candidate) => candidate.sha256 === shaOf(wanted.drawings[i]!))!;
    for (const setting of drawing.parts) {
      const part = settled.parts.find(
        (candidate) => candidate.drawingId === stored.id && candidate.name === setting.name,
      );
      if (!part) throw new Error(`${slug} r${number}: ${drawing.file} has no part called ${setting.name}`);
      const changes: UpdatePartDto = {
        expectedUpdatedAt: part.updatedAt.toISOString(),
        material: setting.material,
        thickness: setting.thickness,
        stock: oneOf<StockKind>(STOCK_KINDS, setting.stock, `${slug}: stock`),
        grain: oneOf<GrainRule>(GRAIN_RULES, setting.grain, `${slug}: grain`),
        quantityOverride: setting.quantity === part.quantity ? null : setting.quantity,
      };
      await revisions.updatePart(actor, slug, number, part.id, changes);
    }
  }
  await revisions.submit(actor, slug, number);
  await revisions.publish(revision.id, new Date(demo.publishedAt));
}
