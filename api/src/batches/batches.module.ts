import { Module } from '@nestjs/common';
import { TargetsModule } from '../targets/targets.module.js';
import { BatchesController } from './batches.controller.js';
import { BatchesService } from './batches.service.js';

@Module({ imports: [TargetsModule], controllers: [BatchesController], providers: [BatchesService], exports: [BatchesService] })
export class BatchesModule {}
