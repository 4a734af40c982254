import { Module } from '@nestjs/common';
import { OverviewController } from './overview.controller.js';
import { OverviewRepository } from './overview.repository.js';
import { OverviewService } from './overview.service.js';

/** The shop-floor figures the console's overview shows: a read model over readings and batches. */
@Module({
  controllers: [OverviewController],
  providers: [OverviewService, OverviewRepository],
})
export class OverviewModule {}
