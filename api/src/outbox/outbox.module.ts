import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { MailDelivery } from './entities/mail-delivery.entity';
import { OutboxEvent } from './entities/outbox-event.entity';
import { MailClock } from './mail-clock';
import { MailOutbox } from './mail-outbox.service';
import { MailRelay } from './mail-relay.service';

/** The mail outbox and its relay; global because every domain that sends mail writes to it. */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([OutboxEvent, MailDelivery])],
  providers: [MailOutbox, MailRelay, MailClock],
  exports: [MailOutbox, MailRelay, MailClock, TypeOrmModule],
})
export class OutboxModule {}
