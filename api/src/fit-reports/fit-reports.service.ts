import { BadRequestException, HttpException, HttpStatus, Inject, Injectable, Logger, NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { MoreThan, Repository } from 'typeorm';
import { AssembliesService } from '../assemblies/assemblies.service';
import { BuildsService } from '../builds/builds.service';
import { newId } from '../common/database/columns';
import { requireImage, type UploadedFileLike } from '../common/uploads/image-file';
import { FitChecksService } from '../fit-checks/fit-checks.service';
import type { Guide } from '../guides/entities/guide.entity';
import { GuidesService } from '../guides/guides.service';
import { publicGuidePath } from '../guides/guide.mapper';
import { StorageService } from '../infra/storage/storage.service';
import { photoIdOf } from '../common/uploads/photo-id';
import { UsersService } from '../users/users.service';
import type { Workshop } from '../workshops/entities/workshop.entity';
import { WorkshopsService } from '../workshops/workshops.service';
import type { CreateFitReportDto, UpdateFitReportDto } from './dto/fit-report.dto';
import type { FitReportResponseDto } from './dto/fit-report-response.dto';
import { FitReportMailPreferences } from './fit-report-mail.port';
import { FitReport, type FitReportStatus } from './entities/fit-report.entity';
import { referenceNotFound } from '../common/http/field-errors';
import type { AppConfig } from '../config/app-config';
import { MailOutbox } from '../outbox/mail-outbox.service';
import { MembersService } from '../workshops/members.service';
import { fitReportArrivedMail } from './fit-report-mails';

export const FIT_REPORT_PHOTO_MAX_BYTES = 15 * 1024 * 1024;
const MAX_PHOTOS = 6;
/** Enough for a keen subscriber, too few to flood a workshop. */
const REPORTS_PER_HOUR = 10;
/** A reporter may add photos until the creator has decided. */
const OPEN_STATUSES: FitReportStatus[] = ['new', 'investigating'];

type Viewer = { kind: 'reporter' } | { kind: 'workshop'; workshopId: string };

/**
 * Fit reports: sent by signed-in readers from a published guide, reviewed by the workshop. The
 * workshop sees the reporter's display name, never their address; the reporter sees the status and
 * the creator's note.
 */
@Injectable()
export class FitReportsService {
  private readonly logger = new Logger(FitReportsService.name);
  private readonly appOrigin: string;

  constructor(
    @InjectRepository(FitReport) private readonly reports: Repository<FitReport>,
    @Inject(GuidesService) private readonly guides: GuidesService,
    @Inject(WorkshopsService) private readonly workshops: WorkshopsService,
    @Inject(BuildsService) private readonly builds: BuildsService,
    @Inject(FitChecksService) private readonly checks: FitChecksService,
    @Inject(AssembliesService) private readonly assemblies: AssembliesService,
    @Inject(UsersService) private readonly users: UsersService,
    private readonly storage: StorageService,
    @Inject(MembersService) private readonly members: MembersService,
    @Inject(MailOutbox) private readonly mail: MailOutbox,
    @Inject(FitReportMailPreferences) private readonly mailPreferences: FitReportMailPreferences,
    config: ConfigService<AppConfig, true>,
  ) {
    this.appOrigin = config.get('appOrigin', { infer: true });
  }

  async create(reporterId: string, workshopSlug: string, guideSlug: string, input: CreateFitReportDto): Promise<FitReportResponseDto> {
    const workshop = await this.workshops.activeBySlug(workshopSlug);
    const guide = workshop ? await this.guides.publishedBySlug(workshop.id, guideSlug) : null;
    if (!workshop || !guide) throw new NotFoundException('This guide is not published.');
    const lastHour = await this.reports.countBy({ reporterId, createdAt: MoreThan(new Date(Date.now() - 3_600_000)) });
    if (lastHour >= REPORTS_PER_HOUR) {
      throw new HttpException(`You have sent ${REPORTS_PER_HOUR} fit reports in the last hour; please wait before sending more.`, HttpStatus.TOO_MANY_REQUESTS);
    }
    const report = await this.reports.save(
      this.reports.create({
        workshopId: workshop.id,
        buildId: guide.buildId,
        guideId: guide.id,
        reporterId,
        outcome: input.outcome,
        parts: input.parts.trim(),
        vehicle: input.vehicle?.trim() ?? '',
        notes: input.notes?.trim() ?? '',
        photoKeys: [],
        status: 'new',
        creatorNote: '',
        fitCheckId: null,
      }),
    );
    await this.tellWorkshop(workshop, guide, report);
    return (await this.describe([report], { kind: 'reporter' }))[0];
  }

  /**
   * One e-mail per owner and editor, written to the mail outbox (its relay sends it), once per report and
   * member. The report is stored already: an outbox that cannot take the mails is logged, not a failed report.
   */
  private async tellWorkshop(workshop: Workshop, guide: Guide, report: FitReport): Promise<void> {
    try {
      const reporter = await this.users.findById(report.reporterId);
      const team = (await this.members.list(workshop.id)).filter((member) => member.role === 'owner' || member.role === 'editor');
      // Each member's own choice: "new fit report" mail at once (default) or off.
      const off = await this.mailPreferences.fitReportMailOff(team.map((member) => member.userId));
      const recipients = team.filter((member) => !off.has(member.userId));
      for (const member of recipients) {
        await this.mail.send({
          kind: 'fit-report',
          idempotencyKey: `fit-report:${report.id}:${member.userId}`,
          userId: member.userId,
          mail: fitReportArrivedMail({
            to: member.email,
            workshopName: workshop.name,
            guideTitle: guide.title,
            reporterName: reporter?.displayName ?? 'A reader',
            outcome: report.outcome,
            parts: report.parts,
            vehicle: report.vehicle,
            reviewUrl: `${this.appOrigin}/workshops/${workshop.id}/fit-reports`,
            links: await this.mailPreferences.fitReportMailLinks(member.userId),
          }),
        });
      }
    } catch (error) {
      this.logger.warn(`fit report ${report.id}: the workshop's e-mails could not be queued: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  /** Stores a photo (PNG, JPEG or WebP, checked by content) with the reporter's own report. */
  async addPhoto(reporterId: string, reportId: string, file: UploadedFileLike | undefined): Promise<FitReportResponseDto> {
    const report = await this.reports.findOneBy({ id: reportId, reporterId });
    if (!report) throw new NotFoundException('Fit report not found');
    if (!OPEN_STATUSES.includes(report.status)) throw new BadRequestException('This report has been decided; it takes no more photos.');
    if (report.photoKeys.length >= MAX_PHOTOS) throw new BadRequestException(`A fit report keeps at most ${MAX_PHOTOS} photos.`);
    const image = requireImage(file, { field: 'photo', what: 'The photo', maxBytes: FIT_REPORT_PHOTO_MAX_BYTES });
    const key = `workshops/${report.workshopId}/fit-reports/${report.id}/${newId()}.${image.extension}`;
    await this.storage.putObject(key, image.bytes, image.contentType);
    report.photoKeys = [...report.photoKeys, key];
    await this.reports.update({ id: report.id }, { photoKeys: report.photoKeys });
    return (await this.describe([report], { kind: 'reporter' }))[0];
  }

  async mine(reporterId: string): Promise<FitReportResponseDto[]> {
    const reports = await this.reports.find({ where: { reporterId }, order: { createdAt: 'DESC' } });
    return this.describe(reports, { kind: 'reporter' });
  }

  async listForWorkshop(workshopId: string, status?: FitReportStatus): Promise<FitReportResponseDto[]> {
    const reports = await this.reports.find({ where: { workshopId, ...(status ? { status } : {}) }, order: { createdAt: 'DESC' } });
    return this.describe(reports, { kind: 'workshop', workshopId });
  }

  async update(workshopId: string, reportId: string, input: UpdateFitReportDto): Promise<FitReportResponseDto> {
    const report = await this.reports.findOneBy({ id: reportId, workshopId });
    if (!report) throw new NotFoundException('Fit report not found');
    if (input.fitCheckId !== undefined) {
      if (input.fitCheckId !== null && !(await this.checks.existsInWorkshop(workshopId, input.fitCheckId))) {
        throw referenceNotFound('fitCheckId', 'Fit check');
      }
      report.fitCheckId = input.fitCheckId;
      // Tying a fresh report to a check is starting to verify it.
      if (input.fitCheckId && report.status === 'new' && input.status === undefined) report.status = 'investigating';
    }
    if (input.status !== undefined) report.status = input.status;
    if (input.creatorNote !== undefined) report.creatorNote = input.creatorNote.trim();
    await this.reports.save(report);
    return (await this.describe([report], { kind: 'workshop', workshopId }))[0];
  }

  async photoUrlForReporter(reporterId: string, reportId: string, photoId: string): Promise<string> {
    const report = await this.reports.findOneBy({ id: reportId, reporterId });
    return this.photoUrl(report, photoId);
  }

  async photoUrlForWorkshop(workshopId: string, reportId: string, photoId: string): Promise<string> {
    const report = await this.reports.findOneBy({ id: reportId, workshopId });
    return this.photoUrl(report, photoId);
  }

  private async photoUrl(report: FitReport | null, photoId: string): Promise<string> {
    const key = report?.photoKeys.find((candidate) => photoIdOf(candidate) === photoId);
    if (!key) throw new NotFoundException('Photo not found');
    return this.storage.presignedGetUrl(key, 300);
  }

  private async describe(reports: FitReport[], viewer: Viewer): Promise<FitReportResponseDto[]> {
    if (reports.length === 0) return [];
    const ids = <K extends keyof FitReport>(key: K) => [...new Set(reports.map((report) => report[key]).filter((id): id is NonNullable<FitReport[K]> => !!id))] as string[];
    const [guides, builds, workshops, checks, reporters] = await Promise.all([
      ids('guideId').length ? this.guides.byIds(ids('guideId')) : [],
      this.builds.byIds(ids('buildId')),
      this.workshops.byIds(ids('workshopId')),
      ids('fitCheckId').length ? this.checks.byIds(ids('fitCheckId')) : [],
      this.users.displayNames(ids('reporterId')),
    ]);
    const assemblies = checks.length ? await this.assemblies.byIds(checks.map((check) => check.assemblyId)) : [];
    return reports.map((report) => {
      const workshop = workshops.find((candidate) => candidate.id === report.workshopId);
      const guide = guides.find((candidate) => candidate.id === report.guideId);
      const build = builds.find((candidate) => candidate.id === report.buildId);
      const check = checks.find((candidate) => candidate.id === report.fitCheckId);
      const photoBase =
        viewer.kind === 'reporter' ? `/api/fit-reports/${report.id}/photos` : `/api/workshops/${viewer.workshopId}/fit-reports/${report.id}/photos`;
      return {
        id: report.id,
        outcome: report.outcome,
        parts: report.parts,
        vehicle: report.vehicle,
        notes: report.notes,
        status: report.status,
        creatorNote: report.creatorNote,
        fitCheck: check
          ? { id: check.id, title: check.title, state: check.state, assemblyName: assemblies.find((candidate) => candidate.id === check.assemblyId)?.name ?? '' }
          : null,
        guide: guide && workshop ? { title: guide.title, path: publicGuidePath(workshop.slug, guide.slug) } : null,
        build: { id: report.buildId, title: build?.title ?? '' },
        workshop: { name: workshop?.name ?? '', slug: workshop?.slug ?? '' },
        reporter: { displayName: reporters.get(report.reporterId) ?? '' },
        photos: report.photoKeys.map((key) => ({ id: photoIdOf(key), url: `${photoBase}/${photoIdOf(key)}` })),
        createdAt: report.createdAt.toISOString(),
        updatedAt: report.updatedAt.toISOString(),
      };
    });
  }
}
