import type { DataSourceOptions } from 'typeorm';
import { entities } from './entities';
import { migrations } from './migrations';

export interface DatabaseSettings {
  DB_HOST: string;
  DB_PORT: number;
  DB_NAME: string;
  DB_USER: string;
  DB_PASSWORD: string;
}

export function dataSourceOptions(settings: DatabaseSettings): DataSourceOptions {
  return {
    type: 'mysql',
    host: settings.DB_HOST,
    port: settings.DB_PORT,
    database: settings.DB_NAME,
    username: settings.DB_USER,
    password: settings.DB_PASSWORD,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
  };
}
