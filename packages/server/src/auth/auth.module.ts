import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import type { Environment } from '../config/environment';
import { MembersModule } from '../members/members.module';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { CsrfGuard } from './csrf.guard';
import { RefreshToken } from './entities/refresh-token.entity';
import { Session } from './entities/session.entity';
import { GithubStrategy } from './github.strategy';
import { JwtStrategy } from './jwt.strategy';
import { RolesGuard } from './roles.guard';
import { SessionAuthGuard } from './session-auth.guard';
import { SessionsService } from './sessions.service';
import { WriteAccessGuard } from './write-access.guard';

@Module({
  imports: [
    MembersModule,
    PassportModule,
    TypeOrmModule.forFeature([Session, RefreshToken]),
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => ({
        secret: config.get('JWT_SECRET', { infer: true }),
        signOptions: { algorithm: 'HS256' },
      }),
    }),
    // Counted in memory, per replica: behind N replicas a client gets up to N times the limit.
    ThrottlerModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => ({
        throttlers: [{ ttl: 60_000, limit: config.get('AUTH_RATE_LIMIT_PER_MINUTE', { infer: true }) }],
        errorMessage: 'Too many sign-in attempts from your address. Wait a minute, then try again.',
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    SessionsService,
    GithubStrategy,
    JwtStrategy,
    // Global guards run in this order: forged requests, then who you are, then what you may do.
    { provide: APP_GUARD, useClass: CsrfGuard },
    { provide: APP_GUARD, useClass: SessionAuthGuard },
    { provide: APP_GUARD, useClass: WriteAccessGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
  exports: [SessionsService],
})
export class AuthModule {}
