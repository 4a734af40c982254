import { Module } from '@nestjs/common';
import { ControlModule } from '../control/control.module.js';
import { LotsModule } from '../lots/lots.module.js';
import { MaterialsModule } from '../materials/materials.module.js';
import { QcCupTestsController } from './qc-cup-tests.controller.js';
import { QcCupTestsService } from './qc-cup-tests.service.js';

@Module({ imports: [LotsModule, MaterialsModule, ControlModule], controllers: [QcCupTestsController], providers: [QcCupTestsService] })
export class QcCupTestsModule {}
