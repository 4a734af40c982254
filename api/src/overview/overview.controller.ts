import { Controller, Get } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { Responds } from '../common/schemas/responds.decorator.js';
import { SchemaQuery } from '../common/schemas/schema.pipe.js';
import { type OverviewQuery, OverviewService } from './overview.service.js';

@ApiTags('overview')
@Controller('overview')
export class OverviewController {
  constructor(private readonly overview: OverviewService) {}

  @Get()
  @Requires('overview:read')
  @Responds(200, 'overview.view')
  @ApiOperation({
    summary: 'The shop floor at a glance: pours today, open rejections, rejection rate per day, ratio error per batch',
    description: 'Counted in PostgreSQL over every reading of the organization, exact at any volume. Days are calendar days in timeZone.',
  })
  get(@Caller() c: RequestContext, @SchemaQuery('overview.query') q: OverviewQuery) {
    return this.overview.overview(c, q);
  }
}
