import { Body, Controller, Get, Post, Query, Req, StreamableFile, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiOperation, ApiParam, ApiProduces, ApiTags } from '@nestjs/swagger';
import { FileInterceptor, type UploadedMultipartFile } from '@nestjs/platform-fastify/multipart';
import type { FastifyRequest } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { isMultipart } from '../common/http/multipart.js';
import { UploadIdempotencyInterceptor } from '../common/idempotency/idempotency.interceptor.js';
import { ProblemException } from '../common/problems.js';
import { DOCUMENT_KINDS, DocumentsService } from './documents.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('material-systems')
@Controller('material-systems/:id/documents')
@ApiParam({ name: 'id', description: 'Material system id', schema: { type: 'string', format: 'uuid' } })
export class DocumentsController {
  constructor(private readonly documents: DocumentsService) {}

  @Get()
  @Requires('shop:read')
  @ApiOperation({ summary: "The system's SDS and TDS documents", description: 'Everyone who reads shop data can reach the SDS of every chemical they handle.' })
  @Responds(200, 'document.view', { array: true })
  list(@Caller() c: RequestContext, @IdParam() id: string, @Query('kind') kind?: string) {
    if (kind !== undefined && !(DOCUMENT_KINDS as readonly string[]).includes(kind)) {
      throw new ProblemException(400, { slug: 'malformed-request', detail: 'The "kind" query parameter must be SDS or TDS.', errors: [{ pointer: '/kind', detail: 'must be one of: SDS, TDS', code: 'enum' }] });
    }
    return this.documents.list(c, id, kind);
  }

  @Post()
  @Requires('shop:write')
  @UseInterceptors(FileInterceptor('file'), UploadIdempotencyInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['kind', 'file'],
      properties: {
        kind: { enum: [...DOCUMENT_KINDS], description: 'SDS (safety data sheet) or TDS (technical data sheet)' },
        title: { type: 'string', maxLength: 200 },
        file: { type: 'string', format: 'binary', description: 'The PDF; checked by its content (%PDF-), size limited (413 above the limit)' },
      },
    },
  })
  @ApiOperation({ summary: 'Upload an SDS or TDS (PDF, multipart/form-data)' })
  @Responds(201, 'document.view')
  upload(@Caller() c: RequestContext, @IdParam() id: string, @UploadedFile() file: UploadedMultipartFile | undefined, @Body() fields: Record<string, unknown> | undefined, @Req() req: FastifyRequest) {
    return this.documents.upload(c, id, isMultipart(req) ? file : null, fields ?? {});
  }

  @Get(':documentId/content')
  @Requires('shop:read')
  @ApiProduces('application/pdf')
  @ApiParam({ name: 'documentId', schema: { type: 'string', format: 'uuid' } })
  @ApiOperation({ summary: 'Download a document (application/pdf)' })
  @Responds(200, 'document.view', { mediaType: 'application/pdf', description: 'The PDF' })
  async content(@Caller() c: RequestContext, @IdParam() id: string, @IdParam('documentId') documentId: string) {
    const { row, content } = await this.documents.content(c, id, documentId);
    const ascii = row.file_name.replace(/[^\x20-\x7e]/g, '_');
    return new StreamableFile(content, {
      type: 'application/pdf',
      length: content.length,
      disposition: `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(row.file_name)}`,
    });
  }
}
