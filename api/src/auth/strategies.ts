import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy as JwtStrategyBase } from 'passport-jwt';
import type { Env } from '../config/env.js';
import type { Principal } from './principal.js';
import { AccountsService } from '../users/accounts.service.js';
import { type AccessClaims, TokensService } from './tokens.service.js';

export type { AccessClaims };


/** People: a short-lived access JWT in `Authorization: Bearer`. The user row is re-read, so a
 *  disabled account or a changed role takes effect at once, not when the token expires. */
@Injectable()
export class JwtStrategy extends PassportStrategy(JwtStrategyBase, 'jwt') {
  constructor(config: ConfigService<Env, true>, private readonly users: AccountsService, private readonly tokens: TokensService) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: config.get('JWT_SECRET', { infer: true }),
      algorithms: ['HS256'],
      issuer: 'pourgate',
      audience: 'pourgate-api',
    });
  }

  async validate(claims: AccessClaims): Promise<Principal | false> {
    if (claims.typ !== 'access' || typeof claims.sid !== 'string') return false;
    const [u, alive] = await Promise.all([this.users.findById(claims.sub), this.tokens.sessionAlive(claims.sid)]);
    if (!u || u.disabled || u.organization_id !== claims.org || !alive) return false;
    return { kind: 'user', id: u.id, organizationId: u.organization_id, role: u.role, email: u.email, name: u.name, sessionId: claims.sid };
  }
}
