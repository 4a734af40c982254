import { Module } from '@nestjs/common';
import { LotsModule } from '../lots/lots.module.js';
import { TargetsModule } from '../targets/targets.module.js';
import { BatchesController } from './batches.controller.js';
import { BatchesService } from './batches.service.js';

@Module({ imports: [TargetsModule, LotsModule], controllers: [BatchesController], providers: [BatchesService], exports: [BatchesService] })
export class BatchesModule {}
