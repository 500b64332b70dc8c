import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import { createServer, type Socket } from 'node:net';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { AppModule } from '../src/app.module';
import type { Environment } from '../src/config/environment';
import { MailService } from '../src/mail/mail.service';
import type { PlanCardPageDto, PlanDetailDto } from '../src/plans/dto/plan.dto';
import type { RevisionDetailDto } from '../src/plans/dto/revision.dto';
import type {
  ReviewDecisionDto,
  ReviewDecisionResultDto,
  SubmissionDto,
  SubmissionPageDto,
} from '../src/review/dto/review.dto';
import { setupApp } from '../src/setup-app';
import { createTestApp } from './app-factory';
import { createProviderAccount, type ProviderAccount } from './fake-provider';
import { client, PLAN, revisionIdOf, type Client } from './plan-helpers';
import { hiddenPlan, mailTo, publishedPlan, submittedPlan } from './review-helpers';
import { signInAs } from './sign-in-flow';

const revisionPath = (slug: string, number = 1) => `/api/plans/${slug}/revisions/${number}`;

interface DecisionRow {
  decision: string;
  notes: string;
  moderator_id: number | null;
}
interface AuditRow {
  action: string;
  actor_id: number | null;
  subject_id: number;
  revision_id: number | null;
}

describe('the review desk (e2e, MariaDB and the fake inbox)', () => {
  let app: INestApplication<App>;
  let server: App;
  let database: DataSource;
  let designer: ProviderAccount;
  let asDesigner: Client;
  let asModerator: Client;
  let asAdmin: Client;
  let asBuilder: Client;
  let anonymous: Client;
  let designerId: number;
  let moderatorId: number;

  const memberId = async (login: string) =>
    Number(((await database.query('SELECT id FROM members WHERE login = ?', [login])) as Array<{ id: number }>)[0]!.id);
  const decisionRows = async (slug: string, number = 1) =>
    (await database.query(
      'SELECT decision, notes, moderator_id FROM review_decisions WHERE revision_id = ? ORDER BY id',
      [await revisionIdOf(app, slug, number)],
    )) as DecisionRow[];
  const auditRows = async (slug: string, number = 1) =>
    (await database.query(
      'SELECT action, actor_id, subject_id, revision_id FROM audit_log WHERE revision_id = ? ORDER BY id',
      [await revisionIdOf(app, slug, number)],
    )) as AuditRow[];
  const stateOf = async (slug: string, number = 1) =>
    (
      (await database.query('SELECT state FROM revisions WHERE id = ?', [
        await revisionIdOf(app, slug, number),
      ])) as Array<{
        state: string;
      }>
    )[0]!.state;
  const queueSlugs = async () =>
    ((await asModerator.get('/api/review/revisions?pageSize=100').expect(200)).body as SubmissionPageDto).items.map(
      (item) => item.plan.slug,
    );
  const librarySlugs = async () =>
    ((await anonymous.get('/api/plans?pageSize=100').expect(200)).body as PlanCardPageDto).items.map(
      (plan) => plan.slug,
    );
  const mailsAbout = async (subjectPart: string, atLeast = 1) =>
    (await mailTo(designer.email, { atLeast })).filter((mail) => mail.subject.includes(subjectPart));

  beforeAll(async () => {
    app = await createTestApp();
    server = app.getHttpServer();
    database = app.get(DataSource);
    designer = await createProviderAccount('review-designer');
    asDesigner = client(server, await signInAs(server, designer.login));
    const admin = await signInAs(server, 'demo-admin');
    asAdmin = client(server, admin);
    await signInAs(server, 'demo-moderator');
    await asAdmin.post('/api/admin/members/demo-moderator/moderator').expect(200);
    asModerator = client(server, await signInAs(server, 'demo-moderator'));
    asBuilder = client(server, await signInAs(server, 'demo-builder'));
    anonymous = client(server);
    designerId = await memberId(designer.login);
    moderatorId = await memberId('demo-moderator');
  });

  afterAll(async () => {
    await app.close();
  });

  describe('the queue', () => {
    let complete: string;
    let unsafe: string;

    beforeAll(async () => {
      complete = await submittedPlan(app, designer.login);
      unsafe = await submittedPlan(app, designer.login, { toolsNeeded: ['router-table'], safetyNotes: '' });
    });

    it('lists submitted revisions oldest first with their checklists, for moderators and admins', async () => {
      const page = (await asModerator.get('/api/review/revisions?pageSize=100').expect(200)).body as SubmissionPageDto;
      const ours = page.items.filter((item) => [complete, unsafe].includes(item.plan.slug));
      expect(ours.map((item) => item.plan.slug)).toEqual([complete, unsafe]);
      expect(page.items.map((item) => item.submittedAt)).toEqual(page.items.map((item) => item.submittedAt).sort());
      const [first, second] = ours as [SubmissionDto, SubmissionDto];
      expect(first).toMatchObject({
        number: 1,
        state: 'submitted',
        ownPlan: false,
        plan: { designer: { login: designer.login }, licence: 'CC-BY-4.0', tools: ['table-saw'] },
      });
      // The demo sled's r1: four outlines, one of them twice (plans-seed/plans/five-cut-crosscut-sled).
      expect(first.checklist.map((check) => [check.check, check.ok])).toEqual([
        ['drawing', true],
        ['cut-list', true],
        ['safety-notes', true],
        ['licence', true],
      ]);
      expect(first.checklist[0]!.summary).toBe('1 drawing, 4 parts');
      const safety = second.checklist.find((check) => check.check === 'safety-notes')!;
      expect(safety).toMatchObject({ ok: false });
      expect(safety.problems).toEqual(['The plan needs power tools (router table), but has no safety notes.']);
      expect(page.total).toBeGreaterThanOrEqual(2);

      const admin = (await asAdmin.get('/api/review/revisions?pageSize=1').expect(200)).body as SubmissionPageDto;
      expect(admin).toMatchObject({ page: 1, pageSize: 1, total: page.total });
      expect(admin.items).toHaveLength(1);
    });

    it('shows one submission with its checklist, and no drafts', async () => {
      const one = (await asModerator.get(`/api/review/revisions/${unsafe}/1`).expect(200)).body as SubmissionDto;
      expect(one.plan.slug).toBe(unsafe);
      expect(one.checklist.find((check) => check.check === 'safety-notes')!.ok).toBe(false);
      const draft = (
        await asDesigner
          .post('/api/plans')
          .send({ ...PLAN, title: 'Review draft only' })
          .expect(201)
      ).body as PlanDetailDto;
      await asModerator.get(`/api/review/revisions/${draft.slug}/1`).expect(404);
    });

    it('is refused to members and visitors', async () => {
      expect((await asBuilder.get('/api/review/revisions').expect(403)).body.code).toBe('role_required');
      expect((await asDesigner.get(`/api/review/revisions/${complete}/1`).expect(403)).body.code).toBe('role_required');
      await anonymous.get('/api/review/revisions').expect(401);
    });

    it('lets moderators read a submission in full, never a draft, while others still cannot', async () => {
      const detail = (await asModerator.get(revisionPath(unsafe)).expect(200)).body as RevisionDetailDto;
      expect(detail).toMatchObject({ state: 'submitted', editable: false });
      expect(detail.parts).toHaveLength(4);
      const plan = (await asModerator.get(`/api/plans/${unsafe}`).expect(200)).body as PlanDetailDto;
      expect(plan.revisions.map((revision) => revision.state)).toEqual(['submitted']);
      await asBuilder.get(revisionPath(unsafe)).expect(404);
      await asBuilder.get(`/api/plans/${unsafe}`).expect(404);
      const draft = (
        await asDesigner
          .post('/api/plans')
          .send({ ...PLAN, title: 'Review hidden draft' })
          .expect(201)
      ).body as PlanDetailDto;
      await asModerator.get(`/api/plans/${draft.slug}`).expect(404);
      await asModerator.get(revisionPath(draft.slug)).expect(404);
    });
  });

  describe('publishing', () => {
    it('publishes a submission: the library shows it, the decision and audit rows are kept, the designer is e-mailed', async () => {
      const slug = await submittedPlan(app, designer.login, { title: 'Review published sled' });
      expect(await librarySlugs()).not.toContain(slug);
      const result = (
        await asModerator
          .post(`${revisionPath(slug)}/publish`)
          .send({ notes: 'Clear drawing, thank you.' })
          .expect(200)
      ).body as ReviewDecisionResultDto;
      expect(result).toMatchObject({
        decision: { decision: 'publish', notes: 'Clear drawing, thank you.', moderator: { login: 'demo-moderator' } },
        revision: { number: 1, state: 'published' },
        mail: 'sent',
      });
      expect(Date.parse(result.revision.publishedAt!)).toBeGreaterThan(Date.now() - 60_000);

      expect(await librarySlugs()).toContain(slug);
      const card = (await anonymous.get(`/api/plans/${slug}`).expect(200)).body as PlanDetailDto;
      expect(card.latestRevision).toEqual({ number: 1, publishedAt: result.revision.publishedAt });
      await anonymous.get(revisionPath(slug)).expect(200);
      expect(await queueSlugs()).not.toContain(slug);

      expect(await decisionRows(slug)).toEqual([
        { decision: 'publish', notes: 'Clear drawing, thank you.', moderator_id: moderatorId },
      ]);
      expect(await auditRows(slug)).toEqual([
        {
          action: 'revision_published',
          actor_id: moderatorId,
          subject_id: designerId,
          revision_id: await revisionIdOf(app, slug, 1),
        },
      ]);
      const [mail] = await mailsAbout('Review published sled');
      expect(mail!.subject).toBe('r1 of “Review published sled” is published');
      expect(mail!.text).toContain(`/plans/${slug}?r=1`);
      expect(mail!.text).toContain('Clear drawing, thank you.');

      const audit = (await asAdmin.get('/api/admin/audit?pageSize=100').expect(200)).body as {
        items: Array<{ action: string; revision: { planSlug: string; number: number } | null }>;
      };
      expect(audit.items).toContainEqual(
        expect.objectContaining({
          action: 'revision_published',
          revision: expect.objectContaining({ planSlug: slug, number: 1 }),
        }),
      );

      const again = await asModerator.post(`${revisionPath(slug)}/publish`).expect(409);
      expect(again.body).toMatchObject({
        code: 'revision_not_submitted',
        message: 'r1 is published, not waiting for review.',
      });
      await asModerator.post(`/api/plans/${slug}/revisions/9/publish`).expect(404);
    });

    it('makes r2 the latest published revision, as the library and the plan page pick it', async () => {
      const slug = await publishedPlan(app, designer.login);
      await asDesigner.post(`/api/plans/${slug}/revisions`).expect(201);
      const draft = (await asDesigner.get(revisionPath(slug, 2)).expect(200)).body as RevisionDetailDto;
      await asDesigner
        .patch(revisionPath(slug, 2))
        .send({ expectedUpdatedAt: draft.updatedAt, changelog: 'A wider fence.' })
        .expect(200);
      await asDesigner.post(`${revisionPath(slug, 2)}/submit`).expect(200);
      await asAdmin.post(`${revisionPath(slug, 2)}/publish`).expect(200);
      const plan = (await anonymous.get(`/api/plans/${slug}`).expect(200)).body as PlanDetailDto;
      expect(plan.latestRevision?.number).toBe(2);
      expect(plan.revisions.map((revision) => [revision.number, revision.state])).toEqual([
        [1, 'published'],
        [2, 'published'],
      ]);
    });
  });

  describe('sending back and declining', () => {
    it('sends back with notes: the designer can edit it again, reads the notes and gets them by e-mail', async () => {
      const slug = await submittedPlan(app, designer.login, { title: 'Review sent back jig' });
      const missing = await asModerator
        .post(`${revisionPath(slug)}/send-back`)
        .send({})
        .expect(400);
      expect(missing.body).toMatchObject({ code: 'validation_failed' });
      expect(missing.body.details).toContain('Write notes for the designer (at most 5000 characters).');
      await asModerator
        .post(`${revisionPath(slug)}/send-back`)
        .send({ notes: '   \n ' })
        .expect(400);
      expect(await stateOf(slug)).toBe('submitted');

      const notes = 'The fence part has no thickness on its layer; give it one.';
      const result = (
        await asModerator
          .post(`${revisionPath(slug)}/send-back`)
          .send({ notes })
          .expect(200)
      ).body as ReviewDecisionResultDto;
      expect(result.revision.state).toBe('sent-back');
      const detail = (await asDesigner.get(revisionPath(slug)).expect(200)).body as RevisionDetailDto;
      expect(detail).toMatchObject({ state: 'sent-back', editable: true });
      await anonymous.get(revisionPath(slug)).expect(404);
      expect(await decisionRows(slug)).toEqual([{ decision: 'send-back', notes, moderator_id: moderatorId }]);
      expect((await auditRows(slug)).map((row) => row.action)).toEqual(['revision_sent_back']);
      const [mail] = await mailsAbout('Review sent back jig');
      expect(mail!.subject).toBe('r1 of “Review sent back jig” is sent back to you');
      expect(mail!.text).toContain(`What to change:\n\n${notes}`);
      expect(mail!.text).toContain(`/plans/${slug}/r/1/edit`);

      // Submitted again and published: the history reads newest first.
      await asDesigner.post(`${revisionPath(slug)}/submit`).expect(200);
      await asModerator.post(`${revisionPath(slug)}/publish`).expect(200);
      const history = (await asDesigner.get(`${revisionPath(slug)}/decisions`).expect(200)).body as ReviewDecisionDto[];
      expect(history.map((entry) => [entry.decision, entry.notes])).toEqual([
        ['publish', ''],
        ['send-back', notes],
      ]);
      expect(history[1]!.moderator).toMatchObject({ login: 'demo-moderator' });
      await asModerator.get(`${revisionPath(slug)}/decisions`).expect(200);
      await asAdmin.get(`${revisionPath(slug)}/decisions`).expect(200);
      expect((await asBuilder.get(`${revisionPath(slug)}/decisions`).expect(403)).body.code).toBe('not_owner');
      await anonymous.get(`${revisionPath(slug)}/decisions`).expect(401);
    });

    it('declines with notes, which are required', async () => {
      const slug = await submittedPlan(app, designer.login, { title: 'Review declined jig' });
      await asModerator
        .post(`${revisionPath(slug)}/decline`)
        .send({ notes: '' })
        .expect(400);
      const notes = 'The drawing is a copy of a commercial jig.';
      await asModerator
        .post(`${revisionPath(slug)}/decline`)
        .send({ notes })
        .expect(200);
      expect(await stateOf(slug)).toBe('declined');
      const detail = (await asDesigner.get(revisionPath(slug)).expect(200)).body as RevisionDetailDto;
      expect(detail).toMatchObject({ state: 'declined', editable: false });
      expect(await decisionRows(slug)).toEqual([{ decision: 'decline', notes, moderator_id: moderatorId }]);
      expect((await auditRows(slug)).map((row) => row.action)).toEqual(['revision_declined']);
      const [mail] = await mailsAbout('Review declined jig');
      expect(mail!.text).toContain(`Why:\n\n${notes}`);
      expect(
        (
          await asModerator
            .post(`${revisionPath(slug)}/send-back`)
            .send({ notes: 'Late.' })
            .expect(409)
        ).body.code,
      ).toBe('revision_not_submitted');
      expect(await librarySlugs()).not.toContain(slug);
      // Nothing of the plan is published: the designer reworks it in r2, a copy of the declined r1.
      const next = (await asDesigner.post(`/api/plans/${slug}/revisions`).expect(201)).body as RevisionDetailDto;
      expect(next).toMatchObject({ number: 2, state: 'draft', changelog: '' });
      expect(next.notes).toBe(detail.notes);
      expect(next.parts.map((part) => part.name)).toEqual(detail.parts.map((part) => part.name));
    });
  });

  describe('decisions refused', () => {
    let slug: string;
    beforeAll(async () => {
      slug = await submittedPlan(app, designer.login, { title: 'Review refusals' });
    });

    it('to members, the designer and visitors', async () => {
      expect((await asBuilder.post(`${revisionPath(slug)}/publish`).expect(403)).body.code).toBe('role_required');
      expect((await asDesigner.post(`${revisionPath(slug)}/publish`).expect(403)).body.code).toBe('role_required');
      await anonymous
        .post(`${revisionPath(slug)}/decline`)
        .send({ notes: 'No.' })
        .expect(401);
      expect(await stateOf(slug)).toBe('submitted');
      expect(await decisionRows(slug)).toEqual([]);
    });

    it('to a moderator on their own plan, which another moderator or an admin decides', async () => {
      const own = await submittedPlan(app, 'demo-moderator', { title: 'Review moderator own' });
      const refused = await asModerator.post(`${revisionPath(own)}/publish`).expect(403);
      expect(refused.body.code).toBe('own_plan_review');
      expect(await stateOf(own)).toBe('submitted');
      const listed = (
        (await asModerator.get('/api/review/revisions?pageSize=100').expect(200)).body as SubmissionPageDto
      ).items;
      expect(listed.find((item) => item.plan.slug === own)?.ownPlan).toBe(true);
      await asAdmin.post(`${revisionPath(own)}/publish`).expect(200);
      expect(await stateOf(own)).toBe('published');
    });

    it('to a suspended moderator, who may still read the queue', async () => {
      const account = await createProviderAccount('review-suspended-moderator');
      await signInAs(server, account.login);
      await asAdmin.post(`/api/admin/members/${account.login}/moderator`).expect(200);
      await asAdmin.post(`/api/admin/members/${account.login}/suspension`).expect(200);
      const suspended = client(server, await signInAs(server, account.login));
      await suspended.get('/api/review/revisions').expect(200);
      const refused = await suspended.post(`${revisionPath(slug)}/publish`).expect(403);
      expect(refused.body.code).toBe('member_suspended');
      expect(await stateOf(slug)).toBe('submitted');
    });
  });

  describe('hiding', () => {
    it('hides a published revision with a reason: visitors and the library lose it; restoring brings it back', async () => {
      const slug = await publishedPlan(app, designer.login);
      const before = (await anonymous.get(`/api/plans/${slug}`).expect(200)).body as PlanDetailDto;
      expect(await librarySlugs()).toContain(slug);

      const noReason = await asModerator
        .post(`${revisionPath(slug)}/hide`)
        .send({})
        .expect(400);
      expect(noReason.body.details).toContain('Give the reason for hiding this revision (at most 5000 characters).');
      const reason = 'A member showed that the wiring diagram skips the fuse.';
      const hidden = (
        await asModerator
          .post(`${revisionPath(slug)}/hide`)
          .send({ reason })
          .expect(200)
      ).body as ReviewDecisionResultDto;
      expect(hidden.revision.state).toBe('hidden');

      await anonymous.get(`/api/plans/${slug}`).expect(404);
      await anonymous.get(revisionPath(slug)).expect(404);
      await asBuilder.get(revisionPath(slug)).expect(404);
      expect(await librarySlugs()).not.toContain(slug);
      expect(((await asDesigner.get(revisionPath(slug)).expect(200)).body as RevisionDetailDto).state).toBe('hidden');
      expect(((await asModerator.get(revisionPath(slug)).expect(200)).body as RevisionDetailDto).state).toBe('hidden');
      const mail = await mailsAbout('is hidden');
      expect(mail.some((one) => one.text?.includes(`The reason:\n\n${reason}`))).toBe(true);

      expect(
        (
          await asModerator
            .post(`${revisionPath(slug)}/hide`)
            .send({ reason })
            .expect(409)
        ).body.code,
      ).toBe('revision_not_published');
      const restored = (await asModerator.post(`${revisionPath(slug)}/unhide`).expect(200))
        .body as ReviewDecisionResultDto;
      expect(restored.revision).toMatchObject({ state: 'published', publishedAt: before.latestRevision!.publishedAt });
      expect(((await anonymous.get(`/api/plans/${slug}`).expect(200)).body as PlanDetailDto).latestRevision).toEqual(
        before.latestRevision,
      );
      expect(await librarySlugs()).toContain(slug);
      expect((await asModerator.post(`${revisionPath(slug)}/unhide`).expect(409)).body.code).toBe(
        'revision_not_hidden',
      );
      expect((await decisionRows(slug)).map((row) => [row.decision, row.notes])).toEqual([
        ['hide', reason],
        ['unhide', ''],
      ]);
      expect((await auditRows(slug)).map((row) => row.action)).toEqual(['revision_hidden', 'revision_unhidden']);
    });

    it('hiding the latest of two published revisions shows the one before in the library', async () => {
      const slug = await publishedPlan(app, designer.login);
      await asDesigner.post(`/api/plans/${slug}/revisions`).expect(201);
      const draft = (await asDesigner.get(revisionPath(slug, 2)).expect(200)).body as RevisionDetailDto;
      await asDesigner
        .patch(revisionPath(slug, 2))
        .send({ expectedUpdatedAt: draft.updatedAt, changelog: 'Longer runners.' })
        .expect(200);
      await asDesigner.post(`${revisionPath(slug, 2)}/submit`).expect(200);
      await asModerator.post(`${revisionPath(slug, 2)}/publish`).expect(200);
      await asModerator
        .post(`${revisionPath(slug, 2)}/hide`)
        .send({ reason: 'Runner sizes are wrong.' })
        .expect(200);
      const plan = (await anonymous.get(`/api/plans/${slug}`).expect(200)).body as PlanDetailDto;
      expect(plan.latestRevision?.number).toBe(1);
      expect(plan.revisions.map((revision) => revision.number)).toEqual([1]);
      const search = (await anonymous.get(`/api/plans?q=${encodeURIComponent(plan.title)}`).expect(200))
        .body as PlanCardPageDto;
      expect(search.items.find((card) => card.slug === slug)?.latestRevision?.number).toBe(1);
      const moderatorView = (await asModerator.get(`/api/plans/${slug}`).expect(200)).body as PlanDetailDto;
      expect(moderatorView.revisions.map((revision) => [revision.number, revision.state])).toEqual([
        [1, 'published'],
        [2, 'hidden'],
      ]);
      expect(
        (
          await asModerator
            .post(`${revisionPath(slug)}/hide`)
            .send({})
            .expect(400)
        ).body.code,
      ).toBe('validation_failed');
      const submitted = await submittedPlan(app, designer.login);
      expect(
        (
          await asModerator
            .post(`${revisionPath(submitted)}/hide`)
            .send({ reason: 'x' })
            .expect(409)
        ).body.code,
      ).toBe('revision_not_published');
    });

    it('restores a hidden revision through the same service the desk uses', async () => {
      const slug = await hiddenPlan(app, designer.login, 'demo-moderator');
      expect(await stateOf(slug)).toBe('hidden');
      await asAdmin
        .post(`${revisionPath(slug)}/unhide`)
        .send({ notes: 'Fixed by the designer.' })
        .expect(200);
      expect(await librarySlugs()).toContain(slug);
    });
  });

  describe('the designer’s e-mail', () => {
    it('is not sent when the designer turned e-mails about review decisions off', async () => {
      const account = await createProviderAccount('review-quiet-designer');
      const quiet = client(server, await signInAs(server, account.login));
      await quiet
        .patch(`/api/members/${account.login}/settings`)
        .send({ notifications: { revisionDecided: false } })
        .expect(200);
      const slug = await submittedPlan(app, account.login);
      const result = (await asModerator.post(`${revisionPath(slug)}/publish`).expect(200))
        .body as ReviewDecisionResultDto;
      expect(result.mail).toBe('not-wanted');
      expect(await mailTo(account.email, { atLeast: 0 })).toEqual([]);
    });

    /** The app with its mail sent to an SMTP port of our choosing. */
    async function appWithSmtpPort(port: number): Promise<INestApplication<App>> {
      const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
        .overrideProvider(MailService)
        .useFactory({
          inject: [ConfigService],
          factory: (config: ConfigService<Environment, true>) =>
            new MailService({
              get: (key: keyof Environment) => (key === 'SMTP_PORT' ? port : config.get(key)),
            } as ConfigService<Environment, true>),
        })
        .compile();
      const other = moduleRef.createNestApplication<INestApplication<App>>({ logger: false });
      setupApp(other);
      await other.init();
      return other;
    }

    async function publishThrough(other: INestApplication<App>, title: string): Promise<void> {
      const slug = await submittedPlan(app, designer.login, { title });
      const moderator = client(other.getHttpServer(), await signInAs(other.getHttpServer(), 'demo-moderator'));
      const result = (await moderator.post(`${revisionPath(slug)}/publish`).expect(200))
        .body as ReviewDecisionResultDto;
      expect(result).toMatchObject({ mail: 'failed', revision: { state: 'published' } });
      expect(await stateOf(slug)).toBe('published');
      expect((await decisionRows(slug)).map((row) => row.decision)).toEqual(['publish']);
      expect((await auditRows(slug)).map((row) => row.action)).toEqual(['revision_published']);
      expect(await mailsAbout(title, 0)).toEqual([]);
    }

    it('failing leaves the decision standing', async () => {
      const probe = createServer();
      await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', resolve));
      const { port } = probe.address() as { port: number };
      await new Promise<void>((resolve) => probe.close(() => resolve()));
      const mailDown = await appWithSmtpPort(port);
      try {
        await publishThrough(mailDown, 'Review mail down');
      } finally {
        await mailDown.close();
      }
    });

    it('a relay that accepts and never answers gives up, and the decision still stands', async () => {
      // Takes the connection, never sends its greeting: the send fails at SMTP_TIMEOUT_MS.
      const held = new Set<Socket>();
      const silent = createServer((socket) => held.add(socket));
      await new Promise<void>((resolve) => silent.listen(0, '127.0.0.1', resolve));
      const mailSilent = await appWithSmtpPort((silent.address() as { port: number }).port);
      try {
        await publishThrough(mailSilent, 'Review mail silent');
      } finally {
        await mailSilent.close();
        for (const socket of held) socket.destroy();
        await new Promise<void>((resolve) => silent.close(() => resolve()));
      }
    });
  });
});
