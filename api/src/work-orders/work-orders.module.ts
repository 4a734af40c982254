import { Module } from '@nestjs/common';
import { WorkOrdersController } from './work-orders.controller.js';
import { WorkOrdersService } from './work-orders.service.js';

@Module({ controllers: [WorkOrdersController], providers: [WorkOrdersService], exports: [WorkOrdersService] })
export class WorkOrdersModule {}
