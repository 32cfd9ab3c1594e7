import { Injectable, Logger, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, Repository } from 'typeorm';
import { StorageService } from '../infra/storage/storage.service';
import { CreateBuildDto, UpdateBuildDto } from './dto/build.dto';
import { Build } from './entities/build.entity';

@Injectable()
export class BuildsService {
  private readonly logger = new Logger(BuildsService.name);

  constructor(
    @InjectRepository(Build) private readonly builds: Repository<Build>,
    private readonly storage: StorageService,
  ) {}

  list(workshopId: string): Promise<Build[]> {
    return this.builds.find({ where: { workshopId }, order: { createdAt: 'DESC' } });
  }

  /** Any build lookup goes through the workshop, so another workshop's id answers 404. */
  /** Builds by id (for lists in other domains that name them); unknown ids are simply absent. */
  byIds(ids: string[]): Promise<Build[]> {
    return this.builds.findBy({ id: In(ids) });
  }

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

  /**
   * Deletes the build; the database cascades to its footage, assemblies, checks, guides and reports.
   * Their stored files (videos, posters, evidence and report photos) are removed afterwards.
   */
  async remove(workshopId: string, buildId: string): Promise<void> {
    const build = await this.get(workshopId, buildId);
    const prefixes = await this.storedFolders(workshopId, buildId);
    await this.builds.remove(build);
    for (const prefix of prefixes) {
      await this.storage.deletePrefix(prefix).catch((error: unknown) => {
        // The rows are gone; an unreachable leftover costs less than a failed request.
        this.logger.warn(`build ${buildId} deleted; could not remove ${prefix}: ${error instanceof Error ? error.message : String(error)}`);
      });
    }
  }

  /** The storage folders of what belongs to the build (keys are workshops/<id>/<kind>/<id>/…). */
  private async storedFolders(workshopId: string, buildId: string): Promise<string[]> {
    const rows = async (sql: string) => ((await this.builds.query(sql, [buildId])) as { id: string }[]).map((row) => row.id);
    const footage = await rows('SELECT id FROM footage WHERE build_id = ?');
    const reports = await rows('SELECT id FROM fit_reports WHERE build_id = ?');
    const checks = await rows('SELECT fc.id FROM fit_checks fc JOIN assemblies a ON a.id = fc.assembly_id WHERE a.build_id = ?');
    return [
      ...footage.map((id) => `workshops/${workshopId}/footage/${id}/`),
      ...reports.map((id) => `workshops/${workshopId}/fit-reports/${id}/`),
      ...checks.map((id) => `workshops/${workshopId}/checks/${id}/`),
    ];
  }
}
