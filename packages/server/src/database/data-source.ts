import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateEnvironment } from '../config/environment';
import { dataSourceOptions } from './data-source-options';

/** The one DataSource of the migration CLI (`npm run migration:* -w @jigwright/server`), configured like the app. */
export default new DataSource(dataSourceOptions(validateEnvironment(process.env)));
