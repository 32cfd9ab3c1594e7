import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { FitCheckEvent } from '../fit-checks/entities/fit-check-event.entity';
import { FitCheck } from '../fit-checks/entities/fit-check.entity';
import { GuideRevision } from '../guides/entities/guide-revision.entity';
import { Guide } from '../guides/entities/guide.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import { GuideRead } from './entities/guide-read.entity';
import { GuideRevisionsController } from './guide-revisions.controller';
import { GuideRevisionsService } from './guide-revisions.service';

/** Published guides' earlier revisions, their comparison, and what each signed-in reader last opened. */
@Module({
  imports: [TypeOrmModule.forFeature([Workshop, Guide, GuideRevision, FitCheck, FitCheckEvent, GuideRead])],
  controllers: [GuideRevisionsController],
  providers: [GuideRevisionsService],
})
export class GuideRevisionsModule {}
