import { Controller, Get, HttpCode, Post, Query, Req, Res, UseGuards } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import {
  ApiFoundResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiQuery,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { Request, Response } from 'express';
import { ApiErrorDto } from '../common/api-error.dto';
import type { Environment } from '../config/environment';
import type { GithubIdentity } from '../members/members.service';
import { SessionError } from './auth.errors';
import { AuthService, type IssuedTokens } from './auth.service';
import { GithubAuthGuard, type SignInRequest } from './github-auth.guard';
import { Public } from './public.decorator';
import { REFRESH_COOKIE, SESSION_COOKIE } from './session';
import { refreshCookieOptions, sessionCookieOptions } from './session-cookie';

function cookie(request: Request, name: string): string | undefined {
  const value = (request.cookies as Record<string, string> | undefined)?.[name];
  return value || undefined;
}

/** Sign-in, token refresh and sign-out; every route is rate-limited per client address. */
@ApiTags('auth')
@Controller('auth')
@UseGuards(ThrottlerGuard)
@ApiTooManyRequestsResponse({ type: ApiErrorDto, description: 'Too many attempts from this address; wait a minute' })
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly config: ConfigService<Environment, true>,
  ) {}

  private setTokenCookies(response: Response, tokens: IssuedTokens): void {
    const publicUrl = this.config.get('PUBLIC_URL', { infer: true });
    // The access cookie outlives its token so that an expired token can be told from no session.
    const maxAge = this.auth.refreshTtlSeconds * 1000;
    response.cookie(SESSION_COOKIE, tokens.accessToken, { ...sessionCookieOptions(publicUrl), maxAge });
    response.cookie(REFRESH_COOKIE, tokens.refreshToken, { ...refreshCookieOptions(publicUrl), maxAge });
  }

  private clearTokenCookies(response: Response): void {
    const publicUrl = this.config.get('PUBLIC_URL', { infer: true });
    response.clearCookie(SESSION_COOKIE, sessionCookieOptions(publicUrl));
    response.clearCookie(REFRESH_COOKIE, refreshCookieOptions(publicUrl));
  }

  @Public()
  @Get('github')
  @UseGuards(GithubAuthGuard)
  @ApiQuery({ name: 'returnTo', required: false, description: 'A path on this site to come back to' })
  @ApiFoundResponse({ description: 'Redirects to the sign-in provider' })
  startGithubSignIn(@Query('returnTo') _returnTo?: string): void {
    // The guard redirects to the provider before this runs.
  }

  @Public()
  @Get('github/callback')
  @UseGuards(GithubAuthGuard)
  @ApiFoundResponse({
    description: 'Signs the member in and redirects back into the app, or to the sign-in page with an error code',
  })
  async finishGithubSignIn(@Req() request: SignInRequest, @Res() response: Response): Promise<void> {
    const identity = request.user as GithubIdentity | false | undefined;
    if (!identity) {
      response.redirect(`/sign-in?error=${request.signInFailure ?? 'provider_error'}`);
      return;
    }
    this.setTokenCookies(response, await this.auth.signIn(identity));
    response.redirect(request.returnTo ?? '/');
  }

  @Public()
  @Post('refresh')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'A new access token and a new refresh token, in their cookies' })
  @ApiUnauthorizedResponse({
    type: ApiErrorDto,
    description: 'No usable refresh token (missing, expired, ended, or reused — reuse ends the session)',
  })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'The X-Requested-With header is missing' })
  async refresh(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<void> {
    const presented = cookie(request, REFRESH_COOKIE);
    try {
      if (!presented) throw new SessionError('not_signed_in');
      this.setTokenCookies(response, await this.auth.refresh(presented));
    } catch (error) {
      if (error instanceof SessionError) this.clearTokenCookies(response);
      throw error;
    }
  }

  @Public()
  @Post('sign-out')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Ends the session on the server and clears its cookies' })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'The X-Requested-With header is missing' })
  async signOut(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<void> {
    await this.auth.signOut({
      refreshToken: cookie(request, REFRESH_COOKIE),
      accessToken: cookie(request, SESSION_COOKIE),
    });
    this.clearTokenCookies(response);
  }
}
