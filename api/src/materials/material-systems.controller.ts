import { Controller, Get, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { MaterialSystemsService, materialSystemsListSpec, revisionsListSpec } from './material-systems.service.js';
import { type MaterialSystemInput } from '@pourgate/batching';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('material-systems')
@Controller('material-systems')
export class MaterialSystemsController {
  constructor(private readonly systems: MaterialSystemsService) {}

  @Get()
  @Requires('shop:read')
  @ListRoute(materialSystemsListSpec, 'material-system.view')
  @ApiOperation({ summary: 'Material systems (two-part formulations), each at its current revision' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, materialSystemsListSpec);
    const { rows, total } = await this.systems.list(c, q);
    setContentRange(reply, materialSystemsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('shop:read')
  @ApiOperation({ summary: 'One material system at its current revision' })
  @Responds(200, 'material-system.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.systems.get(c, id);
  }

  @Get(':id/revisions')
  @Requires('shop:read')
  @ListRoute(revisionsListSpec, 'material-system-revision.view')
  @ApiOperation({ summary: 'Every revision of a material system, newest first', description: 'Batches keep the revision they were computed with.' })
  async revisions(@Caller() c: RequestContext, @IdParam() id: string, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, revisionsListSpec);
    const { rows, total } = await this.systems.revisions(c, id, q);
    setContentRange(reply, revisionsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Post()
  @Requires('shop:write')
  @ApiOperation({ summary: 'Define a material system', description: 'Quantities in any accepted unit; stored in SI. The mix ratio tolerance is ±5 % unless given.' })
  @Responds(201, 'material-system.view')
  create(@Caller() c: RequestContext, @SchemaBody('material-system.create') body: MaterialSystemInput) {
    return this.systems.create(c, body);
  }

  @Put(':id')
  @Requires('shop:write')
  @ApiOperation({ summary: 'Revise a material system', description: 'The whole system again. A change of any parameter writes a new revision and makes it current.' })
  @Responds(200, 'material-system.view')
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('material-system.create') body: MaterialSystemInput) {
    return this.systems.update(c, id, body);
  }
}
