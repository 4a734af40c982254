import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard as PassportAuthGuard } from '@nestjs/passport';
import type { FastifyRequest } from 'fastify';
import { IS_PUBLIC } from '../common/decorators/public.decorator.js';
import { ProblemException } from '../common/problems.js';
import { API_KEY_HEADER } from '../openapi/openapi.js';
import { Action, ACTIONS, ActionRule, roleAllows } from '@pourgate/permissions';
import { REQUIRED_ACTION } from './requires.decorator.js';
import type { Principal } from './principal.js';
import { ApiKeysService } from '../api-keys/api-keys.service.js';

function unauthorized(detail: string): ProblemException {
  return new ProblemException(401, { detail }, { 'www-authenticate': `Bearer realm="pourgate", ApiKey header="${API_KEY_HEADER}"` });
}

function forbidden(detail: string): ProblemException {
  return new ProblemException(403, { detail });
}

/**
 * The one gate every route passes: who is calling (a person's JWT, or an API key in its header —
 * never in the URL), then whether the matrix allows the route's action. Routes without an action
 * are refused, so a forgotten annotation fails closed.
 */
@Injectable()
export class AuthGuard extends PassportAuthGuard('jwt') implements CanActivate {
  constructor(private readonly reflector: Reflector, private readonly apiKeys: ApiKeysService) {
    super();
  }

  override async canActivate(ctx: ExecutionContext): Promise<boolean> {
    if (ctx.getType() !== 'http') return true;
    const targets = [ctx.getHandler(), ctx.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    const req = ctx.switchToHttp().getRequest<FastifyRequest & { user?: Principal }>();
    const action = this.reflector.getAllAndOverride<Action | undefined>(REQUIRED_ACTION, targets);

    const auth = req.headers.authorization;
    const key = req.headers[API_KEY_HEADER.toLowerCase()];
    if (auth && key) throw unauthorized('Send either a bearer token or an API key, not both.');
    if (!auth && !key) throw unauthorized('This route needs credentials: a bearer token (people) or an API key header (machines).');
    if (typeof auth === 'string' && !/^Bearer\s+\S+$/i.test(auth)) throw unauthorized('The Authorization header must be "Bearer <access token>".');
    let p: Principal;
    if (key) {
      // machines: the key straight from the header (one value, never a URL), without passport's
      // strategy chain, which would first try and fail the JWT strategy on every request
      const found = typeof key === 'string' ? await this.apiKeys.authenticate(key) : null;
      if (!found) throw unauthorized('The API key is unknown, revoked or expired.');
      p = found;
      req.user = p;
    } else {
      await super.canActivate(ctx);
      p = req.user!;
    }
    req.principal = p;
    if (p.kind === 'api_key') this.apiKeys.touch(p.id, req.ip);

    if (!action) throw forbidden('This route declares no permission and is closed.');
    const rule = ACTIONS[action] as ActionRule;
    if (p.kind === 'user') {
      if (!roleAllows(p.role, action)) throw forbidden(`Your role (${p.role}) does not allow ${action}.`);
    } else {
      if (!rule.scope) throw forbidden('API keys cannot use this route; it is for people signed in to the console.');
      if (!p.scopes.includes(rule.scope)) throw forbidden(`This API key lacks the scope ${rule.scope}.`);
    }
    return true;
  }

  /** passport's verdict: no principal means 401, with a reason that says which credential failed. */
  override handleRequest<T>(err: unknown, user: T, _info: unknown, ctx: ExecutionContext): T {
    if (err) throw err;
    if (!user) {
      const req = ctx.switchToHttp().getRequest<FastifyRequest>();
      throw unauthorized(req.headers.authorization ? 'The access token is invalid or expired; refresh it or sign in again.' : 'The API key is unknown, revoked or expired.');
    }
    return user;
  }
}
