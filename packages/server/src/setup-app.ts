import { ValidationPipe, type INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import type { Environment } from './config/environment';

function originOf(url: string | undefined): string[] {
  if (!url) return [];
  try {
    return [new URL(url).origin];
  } catch {
    return [];
  }
}

/** Everything main.ts sets on the app, shared with the e2e tests so that they test the same thing. */
export function setupApp(app: INestApplication): void {
  const config = app.get<ConfigService<Environment, true>>(ConfigService);
  const publicUrl = config.get('PUBLIC_URL', { infer: true });
  const overHttps = publicUrl.startsWith('https:');
  const storageOrigins = originOf(config.get('S3_ENDPOINT', { infer: true }));
  const avatarOrigins = [
    ...originOf(config.get('GITHUB_AUTHORIZE_URL', { infer: true })),
    ...config
      .get('AVATAR_ORIGINS', { infer: true })
      .split(',')
      .map((origin) => origin.trim())
      .filter(Boolean),
  ];

  app.setGlobalPrefix('api', { exclude: [] });
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:', ...avatarOrigins, ...storageOrigins],
          'connect-src': ["'self'", ...storageOrigins],
          'upgrade-insecure-requests': overHttps ? [] : null,
        },
      },
      strictTransportSecurity: overHttps,
    }),
  );
  app.use(cookieParser(config.get('JWT_SECRET', { infer: true })));
  app.useGlobalPipes(new ValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true }));
  app.enableShutdownHooks();

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Jigwright API')
      .setDescription('Plans, revisions, drawings and cut lists of the Jigwright shop-jig library.')
      .setVersion('0.1.0')
      .addCookieAuth('jw_session')
      .build(),
  );
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json' });
}
