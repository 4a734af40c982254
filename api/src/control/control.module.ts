import { Module } from '@nestjs/common';
import { ControlController } from './control.controller.js';
import { ControlRepository } from './control.repository.js';
import { ControlService } from './control.service.js';

/** Statistical control of the pours: charts, baselines, run-rule signals, capability. */
@Module({ controllers: [ControlController], providers: [ControlRepository, ControlService], exports: [ControlService] })
export class ControlModule {}
