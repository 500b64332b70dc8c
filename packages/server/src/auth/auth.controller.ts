import { Controller, Get, HttpCode, Post, Query, Req, Res, UseGuards } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ApiFoundResponse, ApiNoContentResponse, ApiQuery, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { Environment } from '../config/environment';
import type { GithubIdentity } from '../members/members.service';
import { AuthService } from './auth.service';
import { GithubAuthGuard, type SignInRequest } from './github-auth.guard';
import { Public } from './public.decorator';
import { SESSION_COOKIE } from './session';
import { sessionCookieOptions } from './session-cookie';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly config: ConfigService<Environment, true>,
  ) {}

  private get cookieOptions() {
    return sessionCookieOptions(this.config.get('PUBLIC_URL', { infer: true }));
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
    const { token } = await this.auth.signIn(identity);
    response.cookie(SESSION_COOKIE, token, { ...this.cookieOptions, maxAge: this.auth.sessionTtlSeconds * 1000 });
    response.redirect(request.returnTo ?? '/');
  }

  @Public()
  @Post('sign-out')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Ends the session' })
  signOut(@Res({ passthrough: true }) response: Response): void {
    response.clearCookie(SESSION_COOKIE, this.cookieOptions);
  }
}
