import { Controller, Get, HttpCode, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { type LotInput, LotsService, lotsListSpec } from './lots.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('lots')
@Controller('lots')
export class LotsController {
  constructor(private readonly lots: LotsService) {}

  @Get()
  @Requires('shop:read')
  @ListRoute(lotsListSpec, 'lot.view')
  @ApiOperation({ summary: 'Component lots (part A, part B, pigment) with their received, opened and expiry dates' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, lotsListSpec);
    const { rows, total } = await this.lots.list(c, q);
    setContentRange(reply, lotsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('shop:read')
  @ApiOperation({ summary: 'One lot' })
  @Responds(200, 'lot.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.lots.get(c, id);
  }

  @Post()
  @Requires('shop:write')
  @ApiOperation({ summary: 'Record a received lot' })
  @Responds(201, 'lot.view')
  create(@Caller() c: RequestContext, @SchemaBody('lot.create') body: LotInput) {
    return this.lots.create(c, body);
  }

  @Put(':id')
  @Requires('shop:write')
  @ApiOperation({ summary: 'Change a lot (e.g. the date it was opened)', description: 'Part and material system cannot change once batches or cup tests use the lot.' })
  @Responds(200, 'lot.view')
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('lot.create') body: LotInput) {
    return this.lots.update(c, id, body);
  }

  @Post(':id/release-hold')
  @Requires('readings:review')
  @HttpCode(200)
  @ApiOperation({ summary: 'Release a lot held by a failed cup test', description: 'An engineer decides the lot may be used again, with a note saying why (audited; emits lot.hold_released). 409 when the lot is not on hold.' })
  @Responds(200, 'lot.view')
  releaseHold(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('lot.release-hold') body: { note: string }) {
    return this.lots.releaseHold(c, id, body.note);
  }
}
