import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { GuideStepLinks } from '../marks/guide-step-links.port';
import { GuideStep } from './entities/guide-step.entity';
import { Guide } from './entities/guide.entity';
import { GuideStepLookup } from './guide-step-lookup';

/**
 * The ports other domains declare and guides fill. Global, so a domain that guides import (marks) can
 * inject its port without importing guides back.
 */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([Guide, GuideStep])],
  providers: [GuideStepLookup, { provide: GuideStepLinks, useExisting: GuideStepLookup }],
  exports: [GuideStepLinks],
})
export class GuidesPortsModule {}
