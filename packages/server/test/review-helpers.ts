import type { INestApplication } from '@nestjs/common';
import type { Actor } from '../src/common/ownership';
import { MembersService } from '../src/members/members.service';
import type { CreatePlanDto } from '../src/plans/dto/plan.dto';
import { PlansService } from '../src/plans/plans.service';
import { RevisionsService } from '../src/plans/revisions.service';
import { UploadsService } from '../src/plans/uploads.service';
import { ReviewService } from '../src/review/review.service';
import { PLAN, SLED_DXF } from './plan-helpers';

let counter = 0;

async function actorOf(app: INestApplication, login: string): Promise<Actor> {
  const member = await app.get(MembersService).getByLogin(login);
  return { memberId: member.id, role: member.role };
}

/**
 * A plan of `login` whose r1 (the demo sled's drawing, analysed) is submitted for review, made
 * through the same services as the API. Returns its slug.
 */
export async function submittedPlan(
  app: INestApplication,
  login: string,
  details: Partial<CreatePlanDto> & { safetyNotes?: string } = {},
): Promise<string> {
  const actor = await actorOf(app, login);
  const { safetyNotes = 'Keep the blade guard on and push the sled from behind its fence.', ...plan } = details;
  const { slug } = await app
    .get(PlansService)
    .create(actor, { ...PLAN, title: `Review ${login} ${++counter}`, ...plan });
  const { analysed } = await app.get(UploadsService).uploadDrawing(actor, slug, 1, {
    originalname: 'sled.dxf',
    size: SLED_DXF.length,
    buffer: SLED_DXF,
  });
  await analysed;
  const revisions = app.get(RevisionsService);
  const { revision } = await revisions.getReadable(actor, slug, 1);
  await revisions.updateDraft(actor, slug, 1, { expectedUpdatedAt: revision.updatedAt.toISOString(), safetyNotes });
  await revisions.submit(actor, slug, 1);
  return slug;
}

/** A plan of `login` with r1 published (as the seed publishes). */
export async function publishedPlan(app: INestApplication, login: string): Promise<string> {
  const slug = await submittedPlan(app, login);
  const revisions = app.get(RevisionsService);
  const { revision } = await revisions.getReadable(await actorOf(app, login), slug, 1);
  await revisions.publish(revision.id);
  return slug;
}

/** A plan of `login` whose only revision was published and then hidden by `moderatorLogin`. */
export async function hiddenPlan(app: INestApplication, login: string, moderatorLogin: string): Promise<string> {
  const slug = await publishedPlan(app, login);
  await app.get(ReviewService).decide(await actorOf(app, moderatorLogin), slug, 1, 'hide', 'Hidden for a test.');
  return slug;
}

export interface InboxMail {
  id: string;
  subject: string;
  text?: string;
  to: Array<{ address: string }>;
}

/** Mail in the fake inbox (MailDev's API) addressed to `address`, waiting a little for delivery. */
export async function mailTo(address: string, { atLeast = 1 } = {}): Promise<InboxMail[]> {
  const inbox = process.env.MAIL_INBOX_URL;
  if (!inbox) throw new Error('MAIL_INBOX_URL is not set: run the e2e specs through `npm test`.');
  let found: InboxMail[] = [];
  for (let attempt = 0; attempt < 50; attempt++) {
    const response = await fetch(`${inbox}/api/email`);
    const all = (await response.json()) as InboxMail[];
    found = all.filter((mail) => mail.to.some((to) => to.address === address));
    if (found.length >= atLeast) return found;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return found;
}
