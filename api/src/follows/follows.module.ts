import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { Build } from '../builds/entities/build.entity';
import { FitCheckEvidence } from '../fit-checks/entities/fit-check-evidence.entity';
import { FitReport } from '../fit-reports/entities/fit-report.entity';
import { Guide } from '../guides/entities/guide.entity';
import { Mark } from '../marks/entities/mark.entity';
import { Measurement } from '../measurements/entities/measurement.entity';
import { User } from '../users/entities/user.entity';
import { WorkshopMember } from '../workshops/entities/workshop-member.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import { DigestItem } from './entities/digest-item.entity';
import { FitNewsDelivery } from './entities/fit-news-delivery.entity';
import { MailLink } from './entities/mail-link.entity';
import { MailPreference } from './entities/mail-preference.entity';
import { FitChecksModule } from '../fit-checks/fit-checks.module';
import { Follow } from './entities/follow.entity';
import { DigestsService } from './digests.service';
import { FitNewsService } from './fit-news.service';
import { BuildFitNewsRecordController, FitNewsRecordController } from './fit-news-record.controller';
import { FitNewsRecordService } from './fit-news-record.service';
import { FollowsController } from './follows.controller';
import { FollowsService } from './follows.service';
import { MailPreferencesService } from './mail-preferences.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([Follow, FitNewsDelivery, MailPreference, DigestItem, MailLink, FitReport, Workshop, WorkshopMember, Build, Assembly, Guide, User, FitCheckEvidence, Mark, Measurement]),
    FitChecksModule,
  ],
  controllers: [FollowsController, FitNewsRecordController, BuildFitNewsRecordController],
  providers: [FollowsService, FitNewsService, DigestsService, MailPreferencesService, FitNewsRecordService],
  exports: [FollowsService, MailPreferencesService],
})
export class FollowsModule {}
