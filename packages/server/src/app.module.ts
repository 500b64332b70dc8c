import { Module, type DynamicModule } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { APP_FILTER } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { TypeOrmModule } from '@nestjs/typeorm';
import { LoggerModule } from 'nestjs-pino';
import { AdminModule } from './admin/admin.module';
import { AuthModule } from './auth/auth.module';
import { benchRoutes } from './bench/bench.module';
import { ApiExceptionFilter } from './common/api-exception.filter';
import { validateEnvironment, type Environment } from './config/environment';
import { dataSourceOptions } from './database/data-source-options';
import { HealthModule } from './health/health.module';
import { MailModule } from './mail/mail.module';
import { MembersModule } from './members/members.module';
import { PlansModule } from './plans/plans.module';
import { ReviewModule } from './review/review.module';
import { ShopProfilesModule } from './shop-profiles/shop-profiles.module';

/** The built web app, served for every path outside /api so that client-side routes survive a reload. */
function webApp(): DynamicModule[] {
  const rootPath = process.env.WEB_DIST_DIR;
  return rootPath ? [ServeStaticModule.forRoot({ rootPath, exclude: ['/api/{*path}'] })] : [];
}

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, validate: validateEnvironment, cache: true }),
    LoggerModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => ({
        pinoHttp: {
          level: config.get('LOG_LEVEL', { infer: true }),
          redact: ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]'],
          autoLogging: { ignore: (req) => req.url === '/api/health' },
        },
      }),
    }),
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => ({
        ...dataSourceOptions({
          DB_HOST: config.get('DB_HOST', { infer: true }),
          DB_PORT: config.get('DB_PORT', { infer: true }),
          DB_NAME: config.get('DB_NAME', { infer: true }),
          DB_USER: config.get('DB_USER', { infer: true }),
          DB_PASSWORD: config.get('DB_PASSWORD', { infer: true }),
        }),
        retryAttempts: 3,
        retryDelay: 1000,
      }),
    }),
    ...webApp(),
    ...benchRoutes(),
    AuthModule,
    MembersModule,
    AdminModule,
    HealthModule,
    MailModule,
    PlansModule,
    ReviewModule,
    ShopProfilesModule,
  ],
  providers: [{ provide: APP_FILTER, useClass: ApiExceptionFilter }],
})
export class AppModule {}
