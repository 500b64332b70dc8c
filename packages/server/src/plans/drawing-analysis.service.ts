import { cutListPartsFromAnalysis, type DrawingAnalysis, type DrawingUnits } from '@jigwright/core';
import { Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { extname, join } from 'node:path';
import { Piscina } from 'piscina';
import { In, type EntityManager, type Repository } from 'typeorm';
import type { AnalysisOutcome, AnalysisTask } from './analysis.worker';
import { Drawing } from './entities/drawing.entity';
import { Part } from './entities/part.entity';
import { PlanFilesService } from './plan-files.service';
import type { AnalysisStatus } from './vocabulary';

/**
 * How long a claim holds unless its replica renews it. Renewed at every sweep while the analysis
 * waits in the pool or runs, so it only has to outlast a few missed sweeps, not the core's own
 * 30 s analysis limit plus the time in the queue.
 */
export const ANALYSIS_LEASE_SECONDS = 60;
/** How often each replica renews its claims and looks for analyses nobody holds. */
export const ANALYSIS_SWEEP_INTERVAL_MS = 15_000;
/** A drawing whose analysis was taken on this often without an outcome ends failed. */
export const MAX_ANALYSIS_ATTEMPTS = 3;
/** Analyses one replica takes on from the sweep at a time: the pool has two threads, the rest is queue. */
const MAX_HELD_FROM_SWEEP = 4;

const PENDING: AnalysisStatus[] = ['queued', 'analysing'];
const LEASE = `NOW(3) + INTERVAL ${ANALYSIS_LEASE_SECONDS} SECOND`;
const UNHELD = '(lease_until IS NULL OR lease_until < NOW(3))';

export const GAVE_UP_MESSAGE =
  `The analysis of this drawing was started ${MAX_ANALYSIS_ATTEMPTS} times and stopped each time before it finished. ` +
  'Delete it and upload it again, perhaps split into smaller drawings.';
const STOPPED_MESSAGE = 'The analysis stopped unexpectedly. Upload the drawing again.';

export interface SweepResult {
  /** Drawings this sweep took on. */
  claimed: number[];
  /** Drawings this sweep marked failed after too many attempts. */
  gaveUp: number[];
  /** Settles when the analyses this sweep took on have finished; it never rejects. */
  analysed: Promise<void>;
}

/**
 * Drawing analysis off the request thread, in worker threads, safe with several replicas on one
 * database: a replica works on a drawing only while it holds the drawing's claim (a token and a
 * lease in its row, taken with a conditional UPDATE), writes the outcome only under that claim, and
 * renews the lease while it works. A sweep at start-up and then periodically takes on drawings
 * whose replica stopped, and gives up on those that were taken on too often.
 *
 * Under Jest the server runs from its TypeScript sources, so the worker file is a .ts one that
 * tsx's require hook loads; built, it is the compiled .js beside this file.
 */
@Injectable()
export class DrawingAnalysisService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(DrawingAnalysisService.name);
  private readonly fromSources = extname(__filename) === '.ts';
  private readonly pool = new Piscina<AnalysisTask, AnalysisOutcome>({
    filename: join(__dirname, `analysis.worker${extname(__filename)}`),
    execArgv: this.fromSources ? ['--require', require.resolve('tsx/cjs')] : [],
    // The machine's cores are shared with request handling and the database.
    maxThreads: 2,
    minThreads: 0,
    idleTimeout: 30_000,
  });
  /** Claims this replica holds: drawing id → token. */
  private readonly held = new Map<number, string>();
  private fromSweep = 0;
  private timer: NodeJS.Timeout | null = null;
  private tick: Promise<void> | null = null;
  private stopping = false;

  constructor(
    @InjectRepository(Drawing) private readonly drawings: Repository<Drawing>,
    private readonly files: PlanFilesService,
  ) {}

  onApplicationBootstrap(): void {
    this.runTick();
    this.timer = setInterval(() => this.runTick(), ANALYSIS_SWEEP_INTERVAL_MS);
    this.timer.unref();
  }

  async onModuleDestroy(): Promise<void> {
    this.stopping = true;
    if (this.timer) clearInterval(this.timer);
    await this.tick;
    // Hand the unfinished analyses back at once, without counting the attempt: the drawing did not stop us.
    const tokens = [...this.held.values()];
    if (tokens.length > 0) {
      await this.handBack(tokens).catch((error: unknown) =>
        this.logger.warn(`could not hand back analyses: ${String(error)}`),
      );
    }
    await this.pool.destroy().catch((error: unknown) => this.logger.warn(`analysis pool: ${String(error)}`));
  }

  /** Takes a drawing just stored or read again, inside the transaction that wrote it, so that no sweep takes it first. */
  async claim(manager: EntityManager, drawingId: number): Promise<string> {
    const token = randomUUID();
    await manager.update(Drawing, { id: drawingId }, { claimToken: token, leaseUntil: () => LEASE, attempts: 1 });
    return token;
  }

  /** Runs a claimed analysis in the pool and writes its outcome, with the parts it found; never rejects. */
  async analyse(drawingId: number, token: string, text: string): Promise<void> {
    this.held.set(drawingId, token);
    try {
      const drawing = await this.drawings.findOneBy({ id: drawingId, claimToken: token });
      // Deleted meanwhile, or the claim was lost to another replica.
      if (!drawing) return;
      await this.drawings.update({ id: drawingId, claimToken: token }, { status: 'analysing' });
      const outcome = await this.pool.run({
        text,
        ...(drawing.units ? { units: drawing.units as DrawingUnits } : {}),
      });
      if (outcome.ok) await this.saveAnalysis(drawing, token, outcome.analysis);
      else await this.fail(drawingId, token, outcome.message.slice(0, 1000));
    } catch (error) {
      // Shutting down: the claim was handed back for another replica to finish.
      if (this.stopping) return;
      this.logger.error(
        `analysis of drawing ${drawingId}: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`,
      );
      await this.fail(drawingId, token, STOPPED_MESSAGE).catch(() => undefined);
    } finally {
      this.held.delete(drawingId);
    }
  }

  /**
   * Renews this replica's claims, then takes on drawings waiting for an analysis that no replica
   * holds, or ends them failed once they have had their attempts. Every change is a conditional
   * UPDATE by primary key that re-checks the lease, so two replicas sweeping at once never both
   * take the same drawing.
   */
  async sweep(): Promise<SweepResult> {
    await this.renewLeases();
    const candidates = await this.drawings
      .createQueryBuilder('drawing')
      .select(['drawing.id', 'drawing.attempts', 'drawing.storageKey'])
      .where({ status: In(PENDING) })
      .andWhere(UNHELD)
      .orderBy('drawing.id')
      .limit(MAX_HELD_FROM_SWEEP * 2)
      .getMany();
    const claimed: number[] = [];
    const gaveUp: number[] = [];
    const analyses: Promise<void>[] = [];
    for (const candidate of candidates) {
      if (candidate.attempts >= MAX_ANALYSIS_ATTEMPTS) {
        if (await this.giveUp(candidate.id)) gaveUp.push(candidate.id);
        continue;
      }
      if (this.fromSweep >= MAX_HELD_FROM_SWEEP || this.stopping) continue;
      const token = await this.takeOver(candidate.id);
      if (!token) continue;
      claimed.push(candidate.id);
      analyses.push(this.reanalyse(candidate, token));
    }
    return { claimed, gaveUp, analysed: Promise.all(analyses).then(() => undefined) };
  }

  /** One sweep at a time per replica; a failed one is logged and the next tick tries again. */
  private runTick(): void {
    if (this.tick || this.stopping) return;
    this.tick = this.sweep()
      .then((result) => {
        if (result.claimed.length > 0) this.logger.log(`took on the analysis of drawings ${result.claimed.join(', ')}`);
        if (result.gaveUp.length > 0) this.logger.warn(`gave up on drawings ${result.gaveUp.join(', ')}`);
      })
      .catch((error: unknown) => this.logger.error(`analysis sweep: ${String(error)}`))
      .finally(() => {
        this.tick = null;
      });
  }

  private async renewLeases(): Promise<void> {
    const tokens = [...this.held.values()];
    if (tokens.length === 0) return;
    await this.drawings
      .createQueryBuilder()
      .update(Drawing)
      .set({ leaseUntil: () => LEASE })
      .where({ claimToken: In(tokens) })
      .execute();
  }

  private async takeOver(drawingId: number): Promise<string | null> {
    const token = randomUUID();
    const result = await this.drawings
      .createQueryBuilder()
      .update(Drawing)
      .set({ claimToken: token, leaseUntil: () => LEASE, attempts: () => 'attempts + 1' })
      .where({ id: drawingId, status: In(PENDING) })
      .andWhere(UNHELD)
      .andWhere('attempts < :max', { max: MAX_ANALYSIS_ATTEMPTS })
      .execute();
    return result.affected === 1 ? token : null;
  }

  private async giveUp(drawingId: number): Promise<boolean> {
    const result = await this.drawings
      .createQueryBuilder()
      .update(Drawing)
      .set({ status: 'failed', error: GAVE_UP_MESSAGE, claimToken: null, leaseUntil: null })
      .where({ id: drawingId, status: In(PENDING) })
      .andWhere(UNHELD)
      .andWhere('attempts >= :max', { max: MAX_ANALYSIS_ATTEMPTS })
      .execute();
    return result.affected === 1;
  }

  private async reanalyse(drawing: Pick<Drawing, 'id' | 'storageKey'>, token: string): Promise<void> {
    this.fromSweep++;
    try {
      let text: string;
      try {
        text = (await this.files.read(drawing.storageKey)).toString('utf8');
      } catch {
        // The store did not answer: not the drawing's fault, so the attempt does not count; a later sweep tries again.
        await this.handBack([token]).catch(() => undefined);
        return;
      }
      await this.analyse(drawing.id, token, text);
    } finally {
      this.fromSweep--;
    }
  }

  /** Gives claims up for any replica to take at once, not counting the attempt. */
  private async handBack(tokens: string[]): Promise<void> {
    await this.drawings
      .createQueryBuilder()
      .update(Drawing)
      .set({ claimToken: null, leaseUntil: null, attempts: () => 'GREATEST(attempts, 1) - 1' })
      .where({ claimToken: In(tokens) })
      .execute();
  }

  /** Writes a failure if the claim is still this replica's. */
  private async fail(drawingId: number, token: string, error: string): Promise<void> {
    await this.drawings.update(
      { id: drawingId, claimToken: token },
      { status: 'failed', error, claimToken: null, leaseUntil: null },
    );
  }

  private async saveAnalysis(drawing: Drawing, token: string, analysis: DrawingAnalysis): Promise<void> {
    const { parts } = cutListPartsFromAnalysis(analysis);
    await this.drawings.manager.transaction(async (manager) => {
      // The owner may have deleted the drawing while it was analysed, or another replica taken it over.
      const current = await manager.findOne(Drawing, {
        where: { id: drawing.id, claimToken: token },
        lock: { mode: 'pessimistic_write' },
      });
      if (!current) return;
      await manager.update(
        Drawing,
        { id: drawing.id },
        {
          status: 'done',
          error: null,
          analysis,
          entityCount: analysis.entities.expanded,
          claimToken: null,
          leaseUntil: null,
        },
      );
      await manager.delete(Part, { drawingId: drawing.id });
      if (parts.length === 0) return;
      await manager.insert(
        Part,
        parts.map((part, position) => {
          const analysed = analysis.parts[position]!;
          return {
            revisionId: drawing.revisionId,
            drawingId: drawing.id,
            position,
            name: part.name.slice(0, 120),
            quantity: part.quantity,
            quantityOverride: null,
            length: part.length,
            width: part.width,
            thickness: part.thickness,
            material: part.material.slice(0, 120),
            stock: part.stock,
            grain: part.grain,
            outline: { points: analysed.outline.points, holes: analysed.holeOutlines.map((hole) => hole.points) },
          };
        }),
      );
    });
  }
}
