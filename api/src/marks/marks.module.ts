import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { FitCheck } from '../fit-checks/entities/fit-check.entity';
import { FitCheckEvidence } from '../fit-checks/entities/fit-check-evidence.entity';
import { FootageModule } from '../footage/footage.module';
import { GuideStep } from '../guides/entities/guide-step.entity';
import { Guide } from '../guides/entities/guide.entity';
import { Measurement } from '../measurements/entities/measurement.entity';
import { MeasurementsModule } from '../measurements/measurements.module';
import { Part } from '../parts/entities/part.entity';
import { PartsModule } from '../parts/parts.module';
import { Mark } from './entities/mark.entity';
import { MarkSuggestion } from './entities/mark-suggestion.entity';
import { MarkSuggestionsMiner } from './mark-suggestions-miner.service';
import { MarksController } from './marks.controller';
import { MarksProcessor } from './marks.processor';
import { MarksService } from './marks.service';
import { TranscriptAttachedListener } from './transcript-attached.listener';

@Module({
  imports: [TypeOrmModule.forFeature([Mark, MarkSuggestion, Part, Measurement, FitCheck, FitCheckEvidence, Guide, GuideStep]), FootageModule, PartsModule, MeasurementsModule],
  controllers: [MarksController],
  providers: [MarksService, MarkSuggestionsMiner, MarksProcessor, TranscriptAttachedListener],
  exports: [MarksService],
})
export class MarksModule {}
