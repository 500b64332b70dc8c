import 'reflect-metadata';
import { resolve } from 'node:path';
import { NestFactory } from '@nestjs/core';
import { AppModule } from '../app.module';
import { seedDemoData } from './seed-demo-data';

async function seed(): Promise<void> {
  const seedDir = resolve(process.env.SEED_DIR ?? 'plans-seed');
  const avatarBase = process.env.GITHUB_AUTHORIZE_URL ? new URL(process.env.GITHUB_AUTHORIZE_URL).origin : undefined;
  const app = await NestFactory.createApplicationContext(AppModule, { logger: ['error', 'warn'] });
  try {
    await seedDemoData(app, seedDir, avatarBase);
    process.stdout.write('Demo data is in place.\n');
  } finally {
    await app.close();
  }
}

seed().catch((error: unknown) => {
  process.stderr.write(`Seeding failed: ${error instanceof Error ? error.stack : String(error)}\n`);
  process.exit(1);
});
