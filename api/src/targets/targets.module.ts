import { Module } from '@nestjs/common';
import { DocumentsModule } from '../documents/documents.module.js';
import { LotsModule } from '../lots/lots.module.js';
import { MaterialsModule } from '../materials/materials.module.js';
import { MoldsModule } from '../molds/molds.module.js';
import { TargetsController } from './targets.controller.js';
import { TargetsService } from './targets.service.js';

@Module({
  imports: [MaterialsModule, MoldsModule, LotsModule, DocumentsModule],
  controllers: [TargetsController],
  providers: [TargetsService],
  exports: [TargetsService],
})
export class TargetsModule {}
