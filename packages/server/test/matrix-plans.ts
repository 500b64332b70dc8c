import type { INestApplication } from '@nestjs/common';
import type { Actor } from '../src/common/ownership';
import { MembersService } from '../src/members/members.service';
import { PlansService } from '../src/plans/plans.service';
import { RevisionsService } from '../src/plans/revisions.service';
import { UploadsService } from '../src/plans/uploads.service';
import { PLAN, rectangleDxf, SLED_DXF } from './plan-helpers';

/** A member's plans in every state the matrix's rows act on, each row on a plan of its own where it changes one. */
export interface MatrixPlans {
  /** r1 published, with an attachment; `updatedAt` of the plan, for a change of its details. */
  published: { slug: string; attachmentId: number; updatedAt: string };
  /** r1 published and nothing in progress: room to start r2. */
  readyForNext: string;
  /** r1 draft: a drawing without units (and its part), a drawing to delete, an attachment to delete. */
  draft: {
    slug: string;
    updatedAt: string;
    unitlessDrawingId: number;
    drawingToDelete: number;
    partId: number;
    partUpdatedAt: string;
    attachmentId: number;
  };
  /** r1 published, r2 a draft to delete. */
  secondDraft: string;
  /** r1 a draft ready to submit. */
  submittable: string;
  /** r1 submitted. */
  submitted: string;
}

let counter = 0;

/** Builds the plans through the same services as the API (suspended members included: services do not check that). */
export async function createMatrixPlans(app: INestApplication, login: string): Promise<MatrixPlans> {
  const member = await app.get(MembersService).getByLogin(login);
  const actor: Actor = { memberId: member.id, role: member.role };
  const plans = app.get(PlansService);
  const revisions = app.get(RevisionsService);
  const uploads = app.get(UploadsService);

  const plan = async (what: string) =>
    (await plans.create(actor, { ...PLAN, title: `Matrix ${what} ${login} ${++counter}` })).slug;
  const drawing = async (slug: string, bytes: Buffer, name: string) => {
    const { drawing: uploaded, analysed } = await uploads.uploadDrawing(actor, slug, 1, {
      originalname: name,
      size: bytes.length,
      buffer: bytes,
    });
    await analysed;
    return uploaded.id;
  };
  const attachment = async (slug: string, number: number, text: string) => {
    const bytes = Buffer.from(text);
    return (
      await uploads.uploadAttachment(actor, slug, number, {
        originalname: 'notes.txt',
        size: bytes.length,
        buffer: bytes,
      })
    ).id;
  };
  const publishR1 = async (slug: string) => {
    await drawing(slug, SLED_DXF, 'sled.dxf');
    await revisions.submit(actor, slug, 1);
    const { revision } = await revisions.getReadable(actor, slug, 1);
    await revisions.publish(revision.id);
  };

  const published = await plan('published');
  const publishedAttachment = await attachment(published, 1, `published ${published}`);
  await publishR1(published);

  const readyForNext = await plan('ready');
  await publishR1(readyForNext);

  const draft = await plan('draft');
  const unitlessDrawingId = await drawing(draft, rectangleDxf(), 'panel.dxf');
  const drawingToDelete = await drawing(draft, SLED_DXF, 'sled.dxf');
  const draftAttachment = await attachment(draft, 1, `draft ${draft}`);
  const draftRevision = await revisions.getReadable(actor, draft, 1);
  const contents = await revisions.contentsOf(draftRevision.revision.id);
  const unitlessPart = contents.parts.find((part) => part.drawingId === unitlessDrawingId)!;

  const secondDraft = await plan('second');
  await publishR1(secondDraft);
  await revisions.startNew(actor, secondDraft);

  const submittable = await plan('submittable');
  await drawing(submittable, SLED_DXF, 'sled.dxf');

  const submitted = await plan('submitted');
  await drawing(submitted, SLED_DXF, 'sled.dxf');
  await revisions.submit(actor, submitted, 1);

  return {
    published: {
      slug: published,
      attachmentId: publishedAttachment,
      updatedAt: (await plans.getOwned(actor, published)).updatedAt.toISOString(),
    },
    readyForNext,
    draft: {
      slug: draft,
      updatedAt: draftRevision.revision.updatedAt.toISOString(),
      unitlessDrawingId,
      drawingToDelete,
      partId: unitlessPart.id,
      partUpdatedAt: unitlessPart.updatedAt.toISOString(),
      attachmentId: draftAttachment,
    },
    secondDraft,
    submittable,
    submitted,
  };
}
