import { Module } from '@nestjs/common';
import { DevicesModule } from '../devices/devices.module.js';
import { LotsModule } from '../lots/lots.module.js';
import { MaterialsModule } from '../materials/materials.module.js';
import { ControlController } from './control.controller.js';
import { ControlRepository } from './control.repository.js';
import { ControlService } from './control.service.js';

/** Statistical control of the pours: charts, baselines, run-rule signals, capability. */
@Module({ imports: [DevicesModule, LotsModule, MaterialsModule], controllers: [ControlController], providers: [ControlRepository, ControlService], exports: [ControlService] })
export class ControlModule {}
