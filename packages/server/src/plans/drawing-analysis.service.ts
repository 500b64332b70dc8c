import { Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { extname, join } from 'node:path';
import { Piscina } from 'piscina';
import type { AnalysisOutcome, AnalysisTask } from './analysis.worker';

/**
 * Worker threads that analyse drawings off the request thread. Under Jest the server runs from its
 * TypeScript sources, so the worker file is a .ts one that tsx's require hook loads; built, it is
 * the compiled .js beside this file.
 */
@Injectable()
export class DrawingAnalysisService implements OnModuleDestroy {
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

  run(task: AnalysisTask): Promise<AnalysisOutcome> {
    return this.pool.run(task);
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool.destroy().catch((error: unknown) => this.logger.warn(`analysis pool: ${String(error)}`));
  }
}
