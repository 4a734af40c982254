import { Controller, Delete, Get, HttpCode, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { NoStore } from '../common/decorators/no-store.decorator.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { deliveriesListSpec, type EndpointInput, endpointsListSpec, WebhooksService } from './webhooks.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('webhooks')
@Controller('webhook-endpoints')
export class WebhookEndpointsController {
  constructor(private readonly webhooks: WebhooksService) {}

  @Get()
  @Requires('webhooks:read')
  @ListRoute(endpointsListSpec, 'webhook-endpoint.view')
  @ApiOperation({ summary: 'Webhook endpoints (never their secrets)' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, endpointsListSpec);
    const { rows, total } = await this.webhooks.listEndpoints(c, q);
    setContentRange(reply, endpointsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('webhooks:read')
  @ApiOperation({ summary: 'One webhook endpoint' })
  @Responds(200, 'webhook-endpoint.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.webhooks.getEndpoint(c, id);
  }

  @Post()
  @Requires('webhooks:manage')
  @NoStore()
  @ApiOperation({ summary: 'Add an endpoint', description: 'The response carries `secret` (Standard Webhooks `whsec_…`), shown this once. URLs must be http(s) and resolve to public addresses.' })
  @Responds(201, 'webhook-endpoint.created', { description: 'The endpoint with its signing secret' })
  create(@Caller() c: RequestContext, @SchemaBody('webhook-endpoint.create') body: EndpointInput) {
    return this.webhooks.createEndpoint(c, body);
  }

  @Put(':id')
  @Requires('webhooks:manage')
  @ApiOperation({ summary: 'Change an endpoint (URL, description, event types, enabled)' })
  @Responds(200, 'webhook-endpoint.view')
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('webhook-endpoint.update') body: Partial<EndpointInput>) {
    return this.webhooks.updateEndpoint(c, id, body);
  }

  @Delete(':id')
  @Requires('webhooks:manage')
  @ApiOperation({ summary: 'Remove an endpoint (returns what was removed)' })
  @Responds(200, 'webhook-endpoint.view', { description: 'What was removed' })
  remove(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.webhooks.deleteEndpoint(c, id);
  }

  @Post(':id/rotate-secret')
  @Requires('webhooks:manage')
  @NoStore()
  @ApiOperation({ summary: 'New signing secret; both sign during the overlap', description: 'During the overlap every delivery carries two signatures in webhook-signature, so receivers can switch at their pace.' })
  @Responds(201, 'webhook-endpoint.created', { description: 'The endpoint with its new signing secret' })
  rotate(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('webhook-endpoint.rotate') body: { overlapSeconds: number }) {
    return this.webhooks.rotateSecret(c, id, body.overlapSeconds);
  }

  @Post(':id/test')
  @HttpCode(200)
  @Requires('webhooks:manage')
  @ApiOperation({ summary: 'Send a webhook.test event now and see what the receiver answered' })
  @Responds(200, 'webhook-test.result')
  test(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.webhooks.test(c, id);
  }
}

@ApiTags('webhooks')
@Controller('webhook-deliveries')
export class WebhookDeliveriesController {
  constructor(private readonly webhooks: WebhooksService) {}

  @Get()
  @Requires('webhooks:read')
  @ListRoute(deliveriesListSpec, 'webhook-delivery.view')
  @ApiOperation({ summary: 'The delivery log: status, attempts, last answer, next attempt' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, deliveriesListSpec);
    const { rows, total } = await this.webhooks.listDeliveries(c, q);
    setContentRange(reply, deliveriesListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('webhooks:read')
  @ApiOperation({ summary: 'One delivery with every attempt' })
  @Responds(200, 'webhook-delivery.detail')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.webhooks.getDelivery(c, id);
  }

  @Post(':id/replay')
  @HttpCode(200)
  @Requires('webhooks:manage')
  @ApiOperation({ summary: 'Send a finished (delivered, dead or cancelled) delivery again, same webhook-id' })
  @Responds(200, 'webhook-delivery.detail')
  replay(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.webhooks.replay(c, id);
  }

  @Post('replay')
  @HttpCode(200)
  @Requires('webhooks:manage')
  @ApiOperation({ summary: 'Replay every dead-lettered delivery since a time (optionally of one endpoint)' })
  @Responds(200, 'webhook-delivery.replayed')
  replayAll(@Caller() c: RequestContext, @SchemaBody('webhook-delivery.replay') body: { since: string; endpointId?: string }) {
    return this.webhooks.replayFailedSince(c, body.since, body.endpointId);
  }
}
