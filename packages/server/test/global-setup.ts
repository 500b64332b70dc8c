import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateEnvironment } from '../src/config/environment';
import { dataSourceOptions } from '../src/database/data-source-options';

/** A fresh database for each run of the e2e specs, brought up by the committed migrations (never synchronize). */
export default async function globalSetup(): Promise<void> {
  const env = validateEnvironment(process.env);
  const admin = new DataSource({
    type: 'mysql',
    host: env.DB_HOST,
    port: env.DB_PORT,
    username: env.DB_USER,
    password: env.DB_PASSWORD,
  });
  await admin.initialize();
  await admin.query(`DROP DATABASE IF EXISTS \`${env.DB_NAME}\``);
  await admin.query(`CREATE DATABASE \`${env.DB_NAME}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await admin.destroy();
  const dataSource = new DataSource(dataSourceOptions(env));
  await dataSource.initialize();
  await dataSource.runMigrations();
  await dataSource.destroy();
}
