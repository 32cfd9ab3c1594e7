import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { GuideStepLinks } from '../marks/guide-step-links.port';
import { GuideStep } from './entities/guide-step.entity';
import { Guide } from './entities/guide.entity';

/** The guides domain's answer to what other domains ask of its tables (see guides-ports.module.ts). */
@Injectable()
export class GuideStepLookup implements GuideStepLinks {
  constructor(
    @InjectRepository(GuideStep) private readonly steps: Repository<GuideStep>,
    @InjectRepository(Guide) private readonly guides: Repository<Guide>,
  ) {}

  async stepInWorkshop(workshopId: string, stepId: string): Promise<boolean> {
    const step = await this.steps.findOneBy({ id: stepId });
    return Boolean(step) && (await this.guides.existsBy({ id: step!.guideId, workshopId }));
  }
}
