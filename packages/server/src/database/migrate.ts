import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateEnvironment } from '../config/environment';
import { dataSourceOptions } from './data-source-options';

/** Runs the pending migrations; the start and test commands call it before the server starts. */
async function migrate(): Promise<void> {
  const dataSource = new DataSource(dataSourceOptions(validateEnvironment(process.env)));
  await dataSource.initialize();
  try {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    process.stdout.write(
      applied.length
        ? `Applied ${applied.length} migration(s): ${applied.map((m) => m.name).join(', ')}\n`
        : 'Database schema is up to date.\n',
    );
  } finally {
    await dataSource.destroy();
  }
}

migrate().catch((error: unknown) => {
  process.stderr.write(`Migration failed: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
