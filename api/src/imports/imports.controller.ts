import { Controller, Get, Post, Query, Req, Res, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiOperation, ApiTags } from '@nestjs/swagger';
import { FileInterceptor, type UploadedMultipartFile } from '@nestjs/platform-fastify/multipart';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { isMultipart } from '../common/http/multipart.js';
import { OwnIdempotency } from '../common/idempotency/idempotency.interceptor.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { CSV_OPTIONAL, CSV_REQUIRED, MAX_IMPORT_BYTES } from './imports.constants.js';
import { importsListSpec, ImportsService } from './imports.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('readings')
@Controller('imports')
export class ImportsController {
  constructor(private readonly imports: ImportsService) {}

  @Post()
  @Requires('imports:write')
  @OwnIdempotency('the SHA-256 of the file: the same file uploaded again answers 200 with the first import')
  @UseInterceptors(FileInterceptor('file'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: {
        file: {
          type: 'string',
          format: 'binary',
          description: `A logger CSV (UTF-8, at most ${MAX_IMPORT_BYTES / 1024 / 1024} MB) with a header row naming its columns, in any order: ${CSV_REQUIRED.join(', ')} (required), ${CSV_OPTIONAL.join(', ')}. One reading per row, as in POST /v1/readings; device_id may be empty for a device key.`,
        },
      },
    },
  })
  @ApiOperation({ summary: 'Import a logger CSV', description: '202 with the import and its status URL; a queued job checks and ingests every row (GET /v1/imports/{id} shows processed/total, percent and the bad rows with their line numbers).' })
  @Responds(202, 'import.upload', { description: 'Queued' })
  @Responds(200, 'import.upload', { description: 'This file was uploaded before: the first import' })
  async upload(@Caller() c: RequestContext, @UploadedFile() file: UploadedMultipartFile | undefined, @Req() req: FastifyRequest, @Res({ passthrough: true }) reply: FastifyReply) {
    const { created, view } = await this.imports.upload(c, isMultipart(req) ? file : null);
    reply.status(created ? 202 : 200);
    return { ...view, replayed: !created };
  }

  @Get()
  @Requires('readings:read')
  @ListRoute(importsListSpec, 'import.view')
  @ApiOperation({ summary: 'Imports, newest first' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, importsListSpec);
    const { rows, total } = await this.imports.list(c, q);
    setContentRange(reply, importsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('readings:read')
  @ApiOperation({ summary: 'One import: status, progress and bad rows' })
  @Responds(200, 'import.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.imports.get(c, id);
  }
}
