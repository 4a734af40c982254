import { Controller, Get } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { SchemaQuery } from '../common/schemas/schema.pipe.js';
import { EVENT_TYPES } from './event-types.js';
import { EventsService } from './events.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('events')
@Controller('events')
export class EventsController {
  constructor(private readonly events: EventsService) {}

  @Get()
  @Requires('events:read')
  @ApiOperation({
    summary: 'The event feed, for systems that poll instead of receiving webhooks',
    description: `Pass the \`next\` cursor of one page as \`after\` to get the following page; every event appears once, in order. Types: ${Object.keys(EVENT_TYPES).join(', ')}.`,
  })
  @Responds(200, 'event.feed')
  feed(@Caller() c: RequestContext, @SchemaQuery('event.feed-query') q: { after?: string; limit: number; type?: string[] }) {
    return this.events.feed(c.principal.organizationId, q.after, q.limit, q.type);
  }
}
