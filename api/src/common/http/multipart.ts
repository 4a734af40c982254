import type { FastifyRequest } from 'fastify';

/** Whether the request body is multipart/form-data (an upload route tells a 415 apart with it). */
export function isMultipart(req: Pick<FastifyRequest, 'headers'>): boolean {
  return /^multipart\/form-data\b/i.test(String(req.headers['content-type'] ?? ''));
}
