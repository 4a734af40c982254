import { Controller, Get, Post, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { type CupTestInput, QcCupTestsService, cupTestsListSpec } from './qc-cup-tests.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('qc-cup-tests')
@Controller()
export class QcCupTestsController {
  constructor(private readonly cups: QcCupTestsService) {}

  @Get('qc-cup-tests')
  @Requires('shop:read')
  @ListRoute(cupTestsListSpec, 'qc-cup-test.view')
  @ApiOperation({ summary: 'QC cup tests (ASTM D7487 terms: cream, top-of-cup and tack-free times; free-rise density)' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, cupTestsListSpec);
    const { rows, total } = await this.cups.list(c, q);
    setContentRange(reply, cupTestsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get('qc-cup-tests/:id')
  @Requires('shop:read')
  @ApiOperation({ summary: 'One cup test' })
  @Responds(200, 'qc-cup-test.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.cups.get(c, id);
  }

  @Post('qc-cup-tests')
  @Requires('shop:write')
  @ApiOperation({ summary: 'Record a cup test', description: "It joins the system's least-squares fit of expected free-rise density against component temperature." })
  @Responds(201, 'qc-cup-test.view')
  create(@Caller() c: RequestContext, @SchemaBody('qc-cup-test.create') body: CupTestInput) {
    return this.cups.create(c, body);
  }

  @Get('material-systems/:id/free-rise-fit')
  @Requires('shop:read')
  @ApiOperation({ summary: "The least-squares line of the system's cup tests: free-rise density against component temperature", description: 'Null fit below three cups or when all were at one temperature.' })
  @Responds(200, 'free-rise-fit.view')
  fit(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.cups.fit(c, id);
  }
}
