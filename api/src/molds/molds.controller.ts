import { Controller, Get, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { type MoldGeometryInput } from '@pourgate/batching';
import { MoldsService, moldsListSpec } from './molds.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('molds')
@Controller('molds')
export class MoldsController {
  constructor(private readonly molds: MoldsService) {}

  @Get()
  @Requires('shop:read')
  @ListRoute(moldsListSpec, 'mold.view')
  @ApiOperation({ summary: 'Molds with their cavity volumes (m³)' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, moldsListSpec);
    const { rows, total } = await this.molds.list(c, q);
    setContentRange(reply, moldsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('shop:read')
  @ApiOperation({ summary: 'One mold' })
  @Responds(200, 'mold.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.molds.get(c, id);
  }

  @Post()
  @Requires('shop:write')
  @ApiOperation({ summary: 'Define a mold', description: 'Cavity from box or cylinder dimensions, a water fill (mass ÷ density of water at its temperature) or an entered volume; less inserts; times cavities.' })
  @Responds(201, 'mold.view')
  create(@Caller() c: RequestContext, @SchemaBody('mold.create') body: MoldGeometryInput) {
    return this.molds.create(c, body);
  }

  @Put(':id')
  @Requires('shop:write')
  @ApiOperation({ summary: 'Change a mold (the whole record)' })
  @Responds(200, 'mold.view')
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('mold.create') body: MoldGeometryInput) {
    return this.molds.update(c, id, body);
  }
}
