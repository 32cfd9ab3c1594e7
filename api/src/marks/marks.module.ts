import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { FitChecksModule } from '../fit-checks/fit-checks.module';
import { FootageModule } from '../footage/footage.module';
import { MeasurementsModule } from '../measurements/measurements.module';
import { PartsModule } from '../parts/parts.module';
import { Mark } from './entities/mark.entity';
import { MarkSuggestion } from './entities/mark-suggestion.entity';
import { MarkSuggestionsMiner } from './mark-suggestions-miner.service';
import { MarksController } from './marks.controller';
import { MarksProcessor } from './marks.processor';
import { MarksService } from './marks.service';
import { TranscriptAttachedListener } from './transcript-attached.listener';

@Module({
  imports: [TypeOrmModule.forFeature([Mark, MarkSuggestion]), FootageModule, PartsModule, MeasurementsModule, FitChecksModule],
  controllers: [MarksController],
  providers: [MarksService, MarkSuggestionsMiner, MarksProcessor, TranscriptAttachedListener],
  exports: [MarksService],
})
export class MarksModule {}
