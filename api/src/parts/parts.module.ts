import { Module } from '@nestjs/common';
import { DevicesModule } from '../devices/devices.module.js';
import { LotsModule } from '../lots/lots.module.js';
import { MoldsModule } from '../molds/molds.module.js';
import { WorkOrdersModule } from '../work-orders/work-orders.module.js';
import { DefectCausesService } from './defect-causes.service.js';
import { BatchPartsController, DefectCausesController, DefectsController, LotTraceController, PartsController, WorkOrderProductionController } from './parts.controller.js';
import { PartsRepository } from './parts.repository.js';
import { PartsService } from './parts.service.js';
import { ProductionService } from './production.service.js';

@Module({
  imports: [DevicesModule, LotsModule, MoldsModule, WorkOrdersModule],
  controllers: [PartsController, BatchPartsController, DefectCausesController, WorkOrderProductionController, LotTraceController, DefectsController],
  providers: [PartsRepository, PartsService, DefectCausesService, ProductionService],
})
export class PartsModule {}
