import { Controller, Get, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiResponse, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { type WorkOrderInput, WorkOrdersService, workOrdersListSpec } from './work-orders.service.js';
import { LOCATION_HEADER, Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('work-orders')
@Controller('work-orders')
export class WorkOrdersController {
  constructor(private readonly orders: WorkOrdersService) {}

  @Get()
  @Requires('shop:read')
  @ListRoute(workOrdersListSpec, 'work-order.view')
  @ApiOperation({ summary: 'Work orders' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, workOrdersListSpec);
    const { rows, total } = await this.orders.list(c, q);
    setContentRange(reply, workOrdersListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('shop:read')
  @ApiOperation({ summary: 'One work order' })
  @Responds(200, 'work-order.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.orders.get(c, id);
  }

  @Post()
  @Requires('work-orders:write')
  @ApiOperation({
    summary: 'Post a work order (the ERP, with a key scoped work-orders:write)',
    description: 'Idempotent on externalRef: the same reference and body again answers 200 with the existing order; a different body for the same reference answers 409.',
  })
  @ApiResponse({ status: 409, description: 'Already posted with a different body' })
  @Responds(201, 'work-order.view', { description: 'Created', headers: LOCATION_HEADER })
  @Responds(200, 'work-order.view', { description: 'Already posted with this body: the existing order' })
  async post(@Caller() c: RequestContext, @SchemaBody('work-order.create') body: WorkOrderInput, @Res({ passthrough: true }) reply: FastifyReply) {
    const { created, order } = await this.orders.post(c, body);
    reply.status(created ? 201 : 200);
    if (created) reply.header('location', `/v1/work-orders/${order.id}`);
    return order;
  }

  @Put(':id')
  @Requires('work-orders:write')
  @ApiOperation({ summary: 'Change a work order (state, quantity, due date, ...)' })
  @Responds(200, 'work-order.view')
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('work-order.update') body: WorkOrderInput) {
    return this.orders.update(c, id, body);
  }
}
