import { Controller, Get, HttpCode, Post, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { OwnIdempotency } from '../common/idempotency/idempotency.interceptor.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { readingsListSpec } from './readings.repository.js';
import { type ReadingInput, ReadingsService, type ReviewInput } from './readings.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('readings')
@Controller('readings')
export class ReadingsController {
  constructor(private readonly readings: ReadingsService) {}

  @Get()
  @Requires('readings:read')
  @ListRoute(readingsListSpec, 'reading.view')
  @ApiOperation({ summary: 'Readings and their verdicts (the review queue is status=rejected)' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, readingsListSpec);
    const { rows, total } = await this.readings.list(c, q);
    setContentRange(reply, readingsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('readings:read')
  @ApiOperation({ summary: 'One reading, with its verdict and reasons' })
  @Responds(200, 'reading.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.readings.get(c, id);
  }

  @Post()
  @Requires('readings:write')
  @OwnIdempotency('(device, clientReadingId): a reading posted again answers 200 with the first one')
  @ApiOperation({ summary: 'Post one reading', description: '202 with a status URL; judged by a queued job. The same (device, clientReadingId) again answers 200 with the first reading and replayed: true.' })
  @Responds(202, 'reading.queued', { description: 'Stored and queued for judging' })
  @Responds(200, 'reading.replayed', { description: 'Posted before (same device and clientReadingId): the first reading' })
  async create(@Caller() c: RequestContext, @SchemaBody('reading.create') body: ReadingInput, @Res({ passthrough: true }) reply: FastifyReply) {
    const [one] = await this.readings.ingest(c, [body], () => '');
    reply.status(one!.replayed ? 200 : 202);
    return one;
  }

  @Post('bulk')
  @Requires('readings:write')
  @OwnIdempotency('(device, clientReadingId) of each item')
  @ApiOperation({ summary: 'Post up to 1000 readings', description: 'All or nothing: one bad item refuses the whole post, with a pointer to each bad field.' })
  @Responds(202, 'reading.bulk-result', { description: 'Stored; the new readings are queued for judging' })
  @Responds(200, 'reading.bulk-result', { description: 'Every reading was posted before' })
  async bulk(@Caller() c: RequestContext, @SchemaBody('reading.bulk') body: { readings: ReadingInput[] }, @Res({ passthrough: true }) reply: FastifyReply) {
    const items = await this.readings.ingest(c, body.readings, (i) => `/readings/${i}`);
    reply.status(items.every((i) => i.replayed) ? 200 : 202);
    return { items };
  }

  @Post(':id/review')
  @Requires('readings:review')
  @HttpCode(200)
  @ApiOperation({ summary: 'Waive or uphold a rejected reading', description: 'A waiver needs a note; upholding holds the batch, or scraps it with scrap: true.' })
  @Responds(200, 'reading.view')
  review(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('reading.review') body: ReviewInput) {
    return this.readings.review(c, id, body);
  }
}
