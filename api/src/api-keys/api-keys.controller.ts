import { Controller, Get, HttpCode, Post, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import type { ApiKeyScope } from '@pourgate/permissions';
import { Caller, type RequestContext } from '../auth/principal.js';
import { NoStore } from '../common/decorators/no-store.decorator.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { ApiKeysService, apiKeysListSpec } from './api-keys.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('api-keys')
@Controller('api-keys')
export class ApiKeysController {
  constructor(private readonly keys: ApiKeysService) {}

  @Get()
  @Requires('api-keys:read')
  @ListRoute(apiKeysListSpec, 'api-key.view')
  @ApiOperation({ summary: 'API keys: prefix, name, scopes, creator, last use, expiry, state (never the secret)' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, apiKeysListSpec);
    const { rows, total } = await this.keys.list(c, q);
    setContentRange(reply, apiKeysListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('api-keys:read')
  @ApiOperation({ summary: 'One API key (never the secret)' })
  @Responds(200, 'api-key.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.keys.get(c, id);
  }

  @Post()
  @Requires('api-keys:manage')
  @NoStore()
  @ApiOperation({ summary: 'Issue an API key', description: 'The response carries `secret` — the only time it is shown. Send it in the X-Api-Key header. The scopes must be ones the issuer may grant (integrators: the device scopes), and a device key holds only the device scopes; otherwise 403 naming the refused scopes.' })
  @Responds(201, 'api-key.created', { description: 'The key, with its secret (shown once)' })
  create(@Caller() c: RequestContext, @SchemaBody('api-key.create') body: { name: string; kind: 'device' | 'integration'; environment: 'live' | 'test'; scopes: ApiKeyScope[]; deviceId?: string | null; expiresAt?: string | null }) {
    return this.keys.create(c, body);
  }

  @Post(':id/revoke')
  @HttpCode(200)
  @Requires('api-keys:manage')
  @ApiOperation({ summary: 'Revoke a key at once', description: 'Ends every secret of the key together: its predecessor still in a rotation grace period and any successor too. A revoked key cannot be rotated (409).' })
  @Responds(200, 'api-key.view')
  revoke(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.keys.revoke(c, id);
  }

  @Post(':id/rotate')
  @Requires('api-keys:manage')
  @NoStore()
  @ApiOperation({ summary: 'Rotate a key: a new secret now, the old one valid for the grace period' })
  @Responds(201, 'api-key.created', { description: 'The successor key, with its secret (shown once)' })
  rotate(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('api-key.rotate') body: { graceSeconds: number }) {
    return this.keys.rotate(c, id, body.graceSeconds);
  }
}
