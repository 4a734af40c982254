import { Controller, Get, HttpCode, Patch, Post } from '@nestjs/common';
import { RouteConfig } from '@nestjs/platform-fastify';
import { ApiOperation, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { Caller, Origin, type RequestContext } from './principal.js';
import { NoStore } from '../common/decorators/no-store.decorator.js';
import { Requires } from './requires.decorator.js';
import { TokensService } from './tokens.service.js';
import { UsersService } from '../users/users.service.js';
import { Responds, RETRY_AFTER_HEADER } from '../common/schemas/responds.decorator.js';

@ApiTags('auth')
@Controller()
export class AuthController {
  constructor(private readonly tokens: TokensService, private readonly users: UsersService) {}

  @Post('auth/sign-in')
  @Public()
  @HttpCode(200)
  @NoStore()
  @ApiOperation({ summary: 'Sign in with e-mail and password', description: 'Every attempt is counted before the password is checked, per account (also for unknown addresses) and per client address (429 with Retry-After). The message never says whether the e-mail exists.' })
  @ApiTooManyRequestsResponse({ description: 'Throttled: too many attempts for this account or from this address', headers: RETRY_AFTER_HEADER })
  @Responds(200, 'auth.session')
  signIn(@SchemaBody('auth.sign-in') body: { email: string; password: string }, @Origin() origin: { ip: string; userAgent?: string }) {
    return this.tokens.signIn(body.email, body.password, origin);
  }

  @Post('auth/refresh')
  @Public()
  @HttpCode(200)
  @RouteConfig({ rateLimit: {} })
  @NoStore()
  @ApiOperation({ summary: 'Trade a refresh token for a new session', description: 'Refresh tokens rotate: each works once. Presenting a used one ends every session of its family.' })
  @Responds(200, 'auth.session')
  refresh(@SchemaBody('auth.refresh') body: { refreshToken: string }, @Origin() origin: { ip: string; userAgent?: string }) {
    return this.tokens.refresh(body.refreshToken, origin);
  }

  @Post('auth/sign-out')
  @Public()
  @HttpCode(204)
  @ApiOperation({ summary: 'End the session of a refresh token (and its rotations)' })
  @Responds(204, null)
  async signOut(@SchemaBody('auth.refresh') body: { refreshToken: string }) {
    await this.tokens.signOut(body.refreshToken);
  }

  @Get('me')
  @Requires('profile:read')
  @ApiOperation({ summary: 'The signed-in person, their organization and allowed actions' })
  @Responds(200, 'me')
  me(@Caller() c: RequestContext) {
    return this.users.me(c);
  }

  @Patch('me')
  @Requires('profile:read')
  @ApiOperation({ summary: 'Change one’s own name, unit system, notification setting or password' })
  @Responds(200, 'me')
  updateMe(@Caller() c: RequestContext, @SchemaBody('me.update') body: { name?: string; unitSystem?: 'metric' | 'imperial'; notifyRejections?: 'each' | 'digest' | 'off'; notifyDrift?: 'each' | 'off'; currentPassword?: string; newPassword?: string }) {
    return this.users.updateMe(c, body);
  }
}
