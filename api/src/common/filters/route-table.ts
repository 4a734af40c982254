import FindMyWay, { HTTPMethod } from 'find-my-way';
import type { FastifyInstance } from 'fastify';

const METHODS: HTTPMethod[] = ['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS'];

/**
 * Remembers every route Fastify registers so that an unmatched request can be told apart:
 * 405 (the path exists with other methods, with an Allow header) versus 404 (no such path).
 */
export class RouteTable {
  private readonly router = FindMyWay({ ignoreTrailingSlash: true });

  attach(fastify: FastifyInstance): void {
    fastify.addHook('onRoute', (route) => {
      const methods = Array.isArray(route.method) ? route.method : [route.method];
      for (const m of methods) {
        if (!METHODS.includes(m as HTTPMethod) || m === 'OPTIONS') continue;
        try {
          this.router.on(m as HTTPMethod, route.url, () => undefined);
        } catch {
          // a route registered twice (HEAD for GET, say) is fine
        }
      }
    });
  }

  methodsFor(url: string): string[] {
    const path = url.split('?')[0];
    // an empty segment fills no parameter (Fastify does not route `/readings//review` either): a 404
    return METHODS.filter((m) => {
      if (m === 'OPTIONS') return false;
      const found = this.router.find(m, path);
      return found !== null && Object.values(found.params).every((v) => v !== '' && v !== undefined);
    });
  }
}
