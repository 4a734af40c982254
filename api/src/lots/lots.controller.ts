import { Controller, Get, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { type LotInput, LotsService, lotsListSpec } from './lots.service.js';

@ApiTags('lots')
@Controller('lots')
export class LotsController {
  constructor(private readonly lots: LotsService) {}

  @Get()
  @Requires('shop:read')
  @ListRoute(lotsListSpec)
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
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.lots.get(c, id);
  }

  @Post()
  @Requires('shop:write')
  @ApiOperation({ summary: 'Record a received lot' })
  create(@Caller() c: RequestContext, @SchemaBody('lot.create') body: LotInput) {
    return this.lots.create(c, body);
  }

  @Put(':id')
  @Requires('shop:write')
  @ApiOperation({ summary: 'Change a lot (e.g. the date it was opened)', description: 'Part and material system cannot change once batches or cup tests use the lot.' })
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('lot.create') body: LotInput) {
    return this.lots.update(c, id, body);
  }
}
