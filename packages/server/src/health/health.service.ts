import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { StorageService } from '../storage/storage.service';
import type { DependencyHealthDto, HealthDto } from './dto/health.dto';

async function probe(check: () => Promise<unknown>): Promise<DependencyHealthDto> {
  try {
    await check();
    return { status: 'up' };
  } catch (error) {
    return { status: 'down', error: error instanceof Error ? error.message || error.name : String(error) };
  }
}

@Injectable()
export class HealthService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly storage: StorageService,
  ) {}

  async check(): Promise<HealthDto> {
    const [database, storage] = await Promise.all([
      probe(() => this.dataSource.query('SELECT 1')),
      probe(() => this.storage.checkBucket()),
    ]);
    return { status: database.status === 'up' && storage.status === 'up' ? 'ok' : 'degraded', database, storage };
  }
}
