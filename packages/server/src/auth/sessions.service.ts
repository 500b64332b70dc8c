import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, IsNull, Repository } from 'typeorm';
import type { Environment } from '../config/environment';
import type { Member } from '../members/entities/member.entity';
import { SessionError } from './auth.errors';
import { RefreshToken } from './entities/refresh-token.entity';
import { Session, type SessionEndReason } from './entities/session.entity';
import { hashRefreshToken, newRefreshToken } from './refresh-token';

export interface IssuedRefresh {
  memberId: number;
  sessionId: string;
  refreshToken: string;
}

type RotateOutcome =
  { issued: IssuedRefresh } | { failure: 'refresh_invalid' | 'refresh_expired' | 'session_ended' | 'refresh_reused' };

/**
 * Sessions and their rotating refresh tokens, all in MariaDB so that any replica can refresh or end
 * a session that another one started.
 */
@Injectable()
export class SessionsService {
  constructor(
    @InjectRepository(Session) private readonly sessions: Repository<Session>,
    @InjectRepository(RefreshToken) private readonly tokens: Repository<RefreshToken>,
    private readonly config: ConfigService<Environment, true>,
  ) {}

  private get refreshTtlMs(): number {
    return this.config.get('REFRESH_TOKEN_TTL_SECONDS', { infer: true }) * 1000;
  }

  private async issueToken(manager: EntityManager, sessionId: string): Promise<string> {
    const refreshToken = newRefreshToken();
    await manager.insert(RefreshToken, {
      sessionId,
      tokenHash: hashRefreshToken(refreshToken),
      expiresAt: new Date(Date.now() + this.refreshTtlMs),
    });
    return refreshToken;
  }

  /** A new session for a member who just signed in, with its first refresh token. */
  start(memberId: number): Promise<IssuedRefresh> {
    return this.sessions.manager.transaction(async (manager) => {
      const session = await manager.save(manager.create(Session, { memberId }));
      return { memberId, sessionId: session.id, refreshToken: await this.issueToken(manager, session.id) };
    });
  }

  /**
   * Trades a refresh token for a new one in the same session. A token that was already traded is
   * reuse — someone holds a copy — so the whole session ends, for the thief and the owner alike.
   */
  async rotate(presented: string): Promise<IssuedRefresh> {
    const outcome = await this.sessions.manager.transaction(async (manager): Promise<RotateOutcome> => {
      const token = await manager.findOne(RefreshToken, {
        where: { tokenHash: hashRefreshToken(presented) },
        relations: { session: true },
        lock: { mode: 'pessimistic_write' },
      });
      if (!token) return { failure: 'refresh_invalid' };
      if (token.session.endedAt) return { failure: 'session_ended' };
      if (token.replacedAt) {
        await this.endWith(manager, { id: token.sessionId }, 'refresh_reused');
        return { failure: 'refresh_reused' };
      }
      if (token.expiresAt.getTime() <= Date.now()) return { failure: 'refresh_expired' };
      await manager.update(RefreshToken, { id: token.id }, { replacedAt: new Date() });
      return {
        issued: {
          memberId: token.session.memberId,
          sessionId: token.sessionId,
          refreshToken: await this.issueToken(manager, token.sessionId),
        },
      };
    });
    if ('failure' in outcome) throw new SessionError(outcome.failure);
    return outcome.issued;
  }

  /** Ends the session a refresh token belongs to (sign-out); an unknown token changes nothing. */
  async endByRefreshToken(presented: string): Promise<void> {
    const token = await this.tokens.findOneBy({ tokenHash: hashRefreshToken(presented) });
    if (token) await this.endWith(this.sessions.manager, { id: token.sessionId }, 'signed_out');
  }

  async end(sessionId: string, reason: SessionEndReason): Promise<void> {
    await this.endWith(this.sessions.manager, { id: sessionId }, reason);
  }

  /** Ends every session of a member, in the caller's transaction (suspension). */
  async endAllFor(manager: EntityManager, memberId: number, reason: SessionEndReason): Promise<void> {
    await this.endWith(manager, { memberId }, reason);
  }

  private async endWith(
    manager: EntityManager,
    where: { id: string } | { memberId: number },
    reason: SessionEndReason,
  ): Promise<void> {
    await manager.update(Session, { ...where, endedAt: IsNull() }, { endedAt: new Date(), endReason: reason });
  }

  /** The live session an access token names, with its member: one primary-key lookup per request. */
  async findActive(sessionId: string): Promise<(Session & { member: Member }) | null> {
    const session = await this.sessions.findOne({ where: { id: sessionId }, relations: { member: true } });
    return session && !session.endedAt ? session : null;
  }
}
