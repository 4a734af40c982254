import { Controller, Get, Post, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { DisplayUnitsService } from '../users/display-units.service.js';
import { UNITS_QUERY } from '../targets/targets.controller.js';
import { type BatchInput, BatchesService, batchesListSpec, transitionsListSpec } from './batches.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('batches')
@Controller('batches')
export class BatchesController {
  constructor(private readonly batches: BatchesService, private readonly displayUnits: DisplayUnitsService) {}

  @Get()
  @Requires('shop:read')
  @ListRoute(batchesListSpec, 'batch.view')
  @ApiOperation({ summary: 'Batches (one mix each), newest first' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, batchesListSpec);
    const { rows, total } = await this.batches.list(c, q);
    setContentRange(reply, batchesListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('shop:read')
  @ApiOperation({ summary: 'One batch, with a summary of its targets (kg)' })
  @Responds(200, 'batch.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.batches.get(c, id);
  }

  @Get(':id/targets')
  @Requires('targets:read')
  @UNITS_QUERY
  @ApiOperation({ summary: 'The targets stored with a batch', description: "Exactly as computed when the batch was planned (the system revision and mold volume of that moment), in the caller's unit system with SI alongside." })
  @Responds(200, 'batch-targets.view')
  async targets(@Caller() c: RequestContext, @IdParam() id: string, @Query('units') units?: string) {
    return this.batches.storedTargets(c, id, await this.displayUnits.resolve(c, units));
  }

  @Get(':id/transitions')
  @Requires('shop:read')
  @ListRoute(transitionsListSpec, 'batch-transition.view')
  @ApiOperation({ summary: 'The state history of a batch' })
  async transitions(@Caller() c: RequestContext, @IdParam() id: string, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, transitionsListSpec);
    const { rows, total } = await this.batches.transitions(c, id, q);
    setContentRange(reply, transitionsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Post()
  @Requires('shop:write')
  @ApiOperation({ summary: 'Plan a batch and compute its targets', description: 'From a work order or ad hoc. The targets are computed once, now, and stored with every input and the computation version.' })
  @Responds(201, 'batch.view')
  create(@Caller() c: RequestContext, @SchemaBody('batch.create') body: BatchInput) {
    return this.batches.create(c, body);
  }
}
