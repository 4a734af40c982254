import { Module } from '@nestjs/common';
import { LotsModule } from '../lots/lots.module.js';
import { QcCupTestsController } from './qc-cup-tests.controller.js';
import { QcCupTestsService } from './qc-cup-tests.service.js';

@Module({ imports: [LotsModule], controllers: [QcCupTestsController], providers: [QcCupTestsService] })
export class QcCupTestsModule {}
