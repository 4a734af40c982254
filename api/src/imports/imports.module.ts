import { BullModule } from '@nestjs/bull';
import { Module } from '@nestjs/common';
import { MultipartModule } from '@nestjs/platform-fastify/multipart';
import { workerEnabled } from '../config/process-role.js';
import { ReadingsModule } from '../readings/readings.module.js';
import { IMPORT_QUEUE, MAX_IMPORT_BYTES } from './imports.constants.js';
import { ImportsController } from './imports.controller.js';
import { ImportProcessor } from './imports.processor.js';
import { ImportsService } from './imports.service.js';

@Module({
  imports: [
    BullModule.registerQueue({ name: IMPORT_QUEUE }),
    ReadingsModule,
    MultipartModule.register({ limits: { fileSize: MAX_IMPORT_BYTES, files: 1, fields: 2, parts: 3 } }),
  ],
  controllers: [ImportsController],
  providers: [ImportsService, ...(workerEnabled() ? [ImportProcessor] : [])],
  exports: [ImportsService],
})
export class ImportsModule {}
