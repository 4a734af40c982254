import { Module } from '@nestjs/common';
import { DevicesModule } from '../devices/devices.module.js';
import { ReadingsModule } from '../readings/readings.module.js';
import { LiveController } from './live.controller.js';
import { LiveService } from './live.service.js';

/** The live station view: Server-Sent Events fed by PostgreSQL notifications (see LiveService). */
@Module({ imports: [ReadingsModule, DevicesModule], controllers: [LiveController], providers: [LiveService] })
export class LiveModule {}
