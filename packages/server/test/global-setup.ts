import 'reflect-metadata';
import { CreateBucketCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import { DataSource } from 'typeorm';
import { validateEnvironment } from '../src/config/environment';
import { dataSourceOptions } from '../src/database/data-source-options';
import { s3ClientConfig } from '../src/storage/storage.service';

/** The e2e specs' own bucket, so that their files never mix with the browser tests' (npm test names it). */
async function ensureBucket(env: ReturnType<typeof validateEnvironment>): Promise<void> {
  const client = new S3Client(s3ClientConfig(env));
  try {
    await client.send(new CreateBucketCommand({ Bucket: env.S3_BUCKET }));
  } catch (error) {
    const owned =
      error instanceof S3ServiceException && ['BucketAlreadyOwnedByYou', 'BucketAlreadyExists'].includes(error.name);
    if (!owned) throw error;
  } finally {
    client.destroy();
  }
}

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
  await ensureBucket(env);
}
