import { Module } from '@nestjs/common';
import { workerEnabled } from '../config/process-role.js';
import { MailModule } from '../mail/mail.module.js';
import { NotificationsSender } from './notifications.sender.js';
import { NotificationsService } from './notifications.service.js';

@Module({
  imports: [MailModule],
  providers: [NotificationsService, ...(workerEnabled() ? [NotificationsSender] : [])],
  exports: [NotificationsService],
})
export class NotificationsModule {}
