import { createParamDecorator, ExecutionContext } from '@nestjs/common';
import type { ApiKeyScope, Role } from '@pourgate/permissions';

/** Who is calling: a signed-in person or a machine holding an API key. Always one organization. */
export type Principal =
  | { kind: 'user'; id: string; organizationId: string; role: Role; email: string; name: string; sessionId?: string }
  | { kind: 'api_key'; id: string; organizationId: string; scopes: ApiKeyScope[]; deviceId: string | null; name: string; keyKind: 'device' | 'integration'; prefix: string };

export interface RequestContext {
  principal: Principal;
  ip: string;
  userAgent?: string;
  requestId: string;
}

declare module 'fastify' {
  interface FastifyRequest {
    principal?: Principal;
  }
}

/** The caller of this request (set by the authentication guard). */
export const Caller = createParamDecorator((_: unknown, ctx: ExecutionContext): RequestContext => {
  const req = ctx.switchToHttp().getRequest<import('fastify').FastifyRequest>();
  if (!req.principal) throw new Error('Caller used on a route without authentication');
  return { principal: req.principal, ip: req.ip, userAgent: req.headers['user-agent'], requestId: String(req.id) };
});

/** The request's address and agent, for public routes (sign-in) that have no principal yet. */
export const Origin = createParamDecorator((_: unknown, ctx: ExecutionContext) => {
  const req = ctx.switchToHttp().getRequest<import('fastify').FastifyRequest>();
  return { ip: req.ip, userAgent: req.headers['user-agent'], requestId: String(req.id) };
});

export function actorOf(p: Principal): { actorType: 'user' | 'api_key'; actorId: string; actorLabel: string } {
  return p.kind === 'user'
    ? { actorType: 'user', actorId: p.id, actorLabel: p.email }
    : { actorType: 'api_key', actorId: p.id, actorLabel: `${p.name} (${p.prefix}…)` };
}

/**
 * The one device whose data a caller is confined to: a device key sees only its own device's
 * readings (an unbound device key: none, `null`); people and integration keys are not confined
 * (`undefined`) and see the organization's.
 */
export function confinedDevice(p: Principal): string | null | undefined {
  if (p.kind !== 'api_key' || p.keyKind !== 'device') return undefined;
  return p.deviceId;
}
