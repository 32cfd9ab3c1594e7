import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { EvidenceMarks } from '../fit-checks/evidence-marks.port';
import { Mark } from './entities/mark.entity';

/** The marks domain's answer to what other domains ask of its table (see marks-ports.module.ts). */
@Injectable()
export class MarkLookup implements EvidenceMarks {
  constructor(@InjectRepository(Mark) private readonly marks: Repository<Mark>) {}

  existsInWorkshop(workshopId: string, markId: string): Promise<boolean> {
    return this.marks.existsBy({ id: markId, workshopId });
  }
}
