import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AssembliesModule } from '../assemblies/assemblies.module';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { BuildsModule } from '../builds/builds.module';
import { Build } from '../builds/entities/build.entity';
import { FitChecksModule } from '../fit-checks/fit-checks.module';
import { Footage } from '../footage/entities/footage.entity';
import { FootageModule } from '../footage/footage.module';
import { Mark } from '../marks/entities/mark.entity';
import { Measurement } from '../measurements/entities/measurement.entity';
import { Transcript } from '../transcripts/entities/transcript.entity';
import { TranscriptCue } from '../transcripts/entities/transcript-cue.entity';
import { TranscriptsModule } from '../transcripts/transcripts.module';
import { User } from '../users/entities/user.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import { GuideRevision } from './entities/guide-revision.entity';
import { GuideStep } from './entities/guide-step.entity';
import { Guide } from './entities/guide.entity';
import { GuidesController } from './guides.controller';
import { GuidesService } from './guides.service';
import { PublishedGuideCache, publishedGuideStoreProvider } from './published-guide-cache';
import { PublishedGuidesController } from './published-guides.controller';
import { PublishedGuideMediaService } from './published-guide-media.service';
import { PublishedGuidesService } from './published-guides.service';
import { PublishedTranscriptController } from './published-transcript.controller';
import { PublicPageShellService } from './public-page-shell.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([Guide, GuideStep, GuideRevision, Mark, Footage, Assembly, Build, Workshop, User, Transcript, TranscriptCue, Measurement]),
    BuildsModule,
    AssembliesModule,
    FitChecksModule,
    TranscriptsModule,
    FootageModule,
  ],
  controllers: [GuidesController, PublishedGuidesController, PublishedTranscriptController],
  providers: [GuidesService, PublishedGuidesService, PublishedGuideMediaService, PublishedGuideCache, publishedGuideStoreProvider, PublicPageShellService],
  // The shell service serves the studio's page for public guide paths (app.setup.ts).
  exports: [GuidesService, PublicPageShellService],
})
export class GuidesModule {}
