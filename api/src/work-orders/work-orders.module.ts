import { Module } from '@nestjs/common';
import { MaterialsModule } from '../materials/materials.module.js';
import { MoldsModule } from '../molds/molds.module.js';
import { WorkOrdersController } from './work-orders.controller.js';
import { WorkOrdersRepository } from './work-orders.repository.js';
import { WorkOrdersService } from './work-orders.service.js';

@Module({ imports: [MoldsModule, MaterialsModule], controllers: [WorkOrdersController], providers: [WorkOrdersService, WorkOrdersRepository], exports: [WorkOrdersService] })
export class WorkOrdersModule {}
