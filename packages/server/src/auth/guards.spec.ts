import type { ExecutionContext } from '@nestjs/common';
import { Controller, Get } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { DomainError } from '../common/domain-error';
import type { MemberRole } from '../members/entities/member.entity';
import { CsrfGuard } from './csrf.guard';
import { Roles } from './roles.decorator';
import { RolesGuard } from './roles.guard';
import type { Session } from './session';
import { sessionFailureOf } from './session-auth.guard';
import { WriteAccessGuard } from './write-access.guard';

@Controller()
@Roles('admin')
class Routes {
  @Get()
  adminsOnly(): void {}

  @Get()
  @Roles('moderator', 'admin')
  reviewers(): void {}
}

interface FakeRequest {
  method: string;
  headers: Record<string, string>;
  user?: Session;
  get(name: string): string | undefined;
}

function contextFor(
  { method = 'GET', headers = {}, user }: { method?: string; headers?: Record<string, string>; user?: Session },
  handler: keyof Routes = 'adminsOnly',
): ExecutionContext {
  const request: FakeRequest = {
    method,
    headers,
    user,
    get: (name) => headers[name.toLowerCase()],
  };
  return {
    switchToHttp: () => ({ getRequest: () => request }),
    getHandler: () => Routes.prototype[handler],
    getClass: () => Routes,
  } as unknown as ExecutionContext;
}

const session = (role: MemberRole, suspended = false): Session => ({ memberId: 7, sessionId: 's', role, suspended });

function codeOf(run: () => unknown): string | undefined {
  try {
    run();
    return undefined;
  } catch (error) {
    return error instanceof DomainError ? error.code : `not a domain error: ${String(error)}`;
  }
}

describe('CsrfGuard', () => {
  const guard = new CsrfGuard();

  it.each(['POST', 'PUT', 'PATCH', 'DELETE'])('refuses %s without the header', (method) => {
    expect(codeOf(() => guard.canActivate(contextFor({ method })))).toBe('csrf_header_missing');
    expect(
      codeOf(() => guard.canActivate(contextFor({ method, headers: { 'x-requested-with': 'XMLHttpRequest' } }))),
    ).toBe('csrf_header_missing');
  });

  it('lets a change with the header through, and reads without it', () => {
    expect(guard.canActivate(contextFor({ method: 'POST', headers: { 'x-requested-with': 'jigwright' } }))).toBe(true);
    expect(guard.canActivate(contextFor({ method: 'GET' }))).toBe(true);
    expect(guard.canActivate(contextFor({ method: 'HEAD' }))).toBe(true);
  });
});

describe('RolesGuard', () => {
  const guard = new RolesGuard(new Reflector());

  it("reads the controller's roles, and the handler's instead where it has its own", () => {
    expect(guard.canActivate(contextFor({ user: session('admin') }))).toBe(true);
    expect(codeOf(() => guard.canActivate(contextFor({ user: session('moderator') })))).toBe('role_required');
    expect(guard.canActivate(contextFor({ user: session('moderator') }, 'reviewers'))).toBe(true);
    expect(codeOf(() => guard.canActivate(contextFor({ user: session('member') }, 'reviewers')))).toBe('role_required');
  });

  it('asks for a sign-in when there is no session', () => {
    expect(codeOf(() => guard.canActivate(contextFor({})))).toBe('not_signed_in');
  });
});

describe('WriteAccessGuard', () => {
  const guard = new WriteAccessGuard();

  it('lets a suspended member read but not change anything', () => {
    expect(guard.canActivate(contextFor({ method: 'GET', user: session('member', true) }))).toBe(true);
    expect(codeOf(() => guard.canActivate(contextFor({ method: 'PATCH', user: session('member', true) })))).toBe(
      'member_suspended',
    );
    expect(guard.canActivate(contextFor({ method: 'PATCH', user: session('member') }))).toBe(true);
  });
});

describe('sessionFailureOf', () => {
  it('tells an expired token (worth a refresh) from a missing or broken one', () => {
    expect(sessionFailureOf(Object.assign(new Error('jwt expired'), { name: 'TokenExpiredError' }))).toBe(
      'session_expired',
    );
    expect(sessionFailureOf(new Error('No auth token'))).toBe('not_signed_in');
    expect(sessionFailureOf(new Error('invalid signature'))).toBe('session_invalid');
    expect(sessionFailureOf(undefined)).toBe('session_invalid');
  });
});
