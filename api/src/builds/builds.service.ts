import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { CreateBuildDto, UpdateBuildDto } from './dto/build.dto';
import { Build } from './entities/build.entity';

@Injectable()
export class BuildsService {
  constructor(@InjectRepository(Build) private readonly builds: Repository<Build>) {}

  list(workshopId: string): Promise<Build[]> {
    return this.builds.find({ where: { workshopId }, order: { createdAt: 'DESC' } });
  }

  /** Any build lookup goes through the workshop, so another workshop's id answers 404. */
  async get(workshopId: string, buildId: string): Promise<Build> {
    const build = await this.builds.findOneBy({ id: buildId, workshopId });
    if (!build) throw new NotFoundException('Build not found');
    return build;
  }

  create(workshopId: string, userId: string, input: CreateBuildDto): Promise<Build> {
    return this.builds.save(
      this.builds.create({
        workshopId,
        createdBy: userId,
        title: input.title,
        vehicle: input.vehicle ?? '',
        goal: input.goal ?? '',
        status: input.status ?? 'planning',
      }),
    );
  }

  async update(workshopId: string, buildId: string, input: UpdateBuildDto): Promise<Build> {
    const build = await this.get(workshopId, buildId);
    Object.assign(build, input);
    return this.builds.save(build);
  }

  async remove(workshopId: string, buildId: string): Promise<void> {
    const build = await this.get(workshopId, buildId);
    await this.builds.remove(build);
  }
}
