import { BullModule } from '@nestjs/bull';
import { Module } from '@nestjs/common';
import { workerEnabled } from '../config/process-role.js';
import { JudgeProcessor } from './judge.processor.js';
import { JUDGE_QUEUE } from './readings.constants.js';
import { ReadingsController } from './readings.controller.js';
import { ReadingsRepository } from './readings.repository.js';
import { ReadingsService } from './readings.service.js';
import { ReadingsIngestService } from './readings-ingest.service.js';
import { JudgeService } from './judge.service.js';
import { ReviewService } from './review.service.js';
import { BatchReleaseController } from './batch-release.controller.js';
import { BatchesModule } from '../batches/batches.module.js';
import { DevicesModule } from '../devices/devices.module.js';
import { ControlModule } from '../control/control.module.js';

@Module({
  imports: [BullModule.registerQueue({ name: JUDGE_QUEUE }), BatchesModule, DevicesModule, ControlModule],
  controllers: [ReadingsController, BatchReleaseController],
  providers: [ReadingsRepository, ReadingsIngestService, JudgeService, ReviewService, ReadingsService, ...(workerEnabled() ? [JudgeProcessor] : [])],
  exports: [ReadingsService],
})
export class ReadingsModule {}
