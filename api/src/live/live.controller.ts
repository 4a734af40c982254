import { Controller, Get, HttpCode, Post, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiQuery, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { Public } from '../common/decorators/public.decorator.js';
import { Responds } from '../common/schemas/responds.decorator.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { type LiveMessage, LiveService } from './live.service.js';

/** Comment lines keep proxies and the browser from timing out an idle stream. */
const HEARTBEAT_MS = 15_000;

@ApiTags('readings')
@Controller('live')
export class LiveController {
  constructor(private readonly live: LiveService) {}

  @Post('tickets')
  @HttpCode(201)
  @Requires('readings:read')
  @ApiOperation({ summary: 'A ticket for the live station stream', description: 'EventSource cannot send an Authorization header: this authenticated call hands out a ticket (valid 60 s) for GET /v1/live/stream?ticket=…. Name a station or a device to watch, or neither for every device.' })
  @Responds(201, 'live.ticket')
  ticket(@Caller() c: RequestContext, @SchemaBody('live.ticket.create') body: { stationId?: string; deviceId?: string }) {
    return this.live.ticket(c, body);
  }

  @Get('stream')
  @Public()
  @ApiQuery({ name: 'ticket', required: true, description: 'From POST /v1/live/tickets' })
  @ApiOperation({
    summary: 'Live readings as Server-Sent Events',
    description: 'Authenticated by the ticket in the query string (not a header: EventSource cannot set one). The stream opens with an event `ready` (live.ready: the devices watched), then sends an event `reading` (live.event) each time a watched scale posts a reading, when it is judged (with its reasons), and when it is reviewed. A comment line every 15 s keeps it open. Readings written while the stream was closed are not replayed: read them from GET /v1/readings.',
  })
  @Responds(200, 'live.event', { mediaType: 'text/event-stream', description: 'An SSE stream: `event: ready` (live.ready), then `event: reading` lines whose data is a live.event' })
  async stream(@Query('ticket') ticket: string | undefined, @Res() reply: FastifyReply) {
    const { ctx, devices, every } = await this.live.open(ticket);
    reply.hijack();
    const raw = reply.raw;
    raw.writeHead(200, { 'content-type': 'text/event-stream; charset=utf-8', 'cache-control': 'no-store', 'x-accel-buffering': 'no', connection: 'keep-alive' });
    const write = (event: string, data: unknown, id?: string) => raw.write(`event: ${event}\n${id ? `id: ${id}\n` : ''}data: ${JSON.stringify(data)}\n\n`);
    let ended = false;
    const end = () => {
      if (ended) return;
      ended = true;
      clearInterval(beat);
      unsubscribe?.();
      raw.end();
    };
    const beat = setInterval(() => raw.write(': still here\n\n'), HEARTBEAT_MS);
    beat.unref();
    let unsubscribe: (() => void) | undefined;
    raw.on('close', end);
    unsubscribe = await this.live.subscribe({ ctx, devices, every, send: (m: LiveMessage) => write('reading', m, `${m.reading.id}.${m.kind}`) }, end);
    if (ended) unsubscribe();
    write('ready', { devices: [...devices.values()] });
  }
}
