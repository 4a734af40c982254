import { Module } from '@nestjs/common';
import { MultipartModule } from '@nestjs/platform-fastify/multipart';
import { DocumentsController } from './documents.controller.js';
import { documentsConfig, DOCUMENTS_CONFIG, type DocumentsConfig } from './documents.config.js';
import { DOCUMENT_STORE, FilesystemDocumentStore } from './document-store.js';
import { S3DocumentStore } from './s3-document-store.js';
import { DocumentsService } from './documents.service.js';

@Module({
  imports: [
    // only the upload route parses multipart; JSON routes are untouched
    MultipartModule.registerAsync({ useFactory: () => ({ limits: { fileSize: documentsConfig().maxBytes, files: 1, fields: 5, parts: 6 } }) }),
  ],
  controllers: [DocumentsController],
  providers: [
    { provide: DOCUMENTS_CONFIG, useFactory: () => documentsConfig() },
    { provide: DOCUMENT_STORE, inject: [DOCUMENTS_CONFIG], useFactory: (cfg: DocumentsConfig) => (cfg.s3 ? new S3DocumentStore(cfg.s3) : new FilesystemDocumentStore(cfg.dir)) },
    DocumentsService,
  ],
  exports: [DocumentsService],
})
export class DocumentsModule {}
