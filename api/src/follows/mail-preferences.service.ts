import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, Repository } from 'typeorm';
import { ConfigService } from '@nestjs/config';
import { hashSecretToken, newSecretToken } from '../common/secret-token';
import type { AppConfig } from '../config/app-config';
import { isTimeZone } from '../engine/digest-schedule';
import { User } from '../users/entities/user.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import type { MailPreferencesDto, UpdateMailPreferencesDto } from './dto/mail-preferences.dto';
import { FitNewsDelivery } from './entities/fit-news-delivery.entity';
import { Follow, type FollowDelivery } from './entities/follow.entity';
import { MailLink } from './entities/mail-link.entity';
import { DEFAULT_MAIL_PREFERENCE, MailPreference } from './entities/mail-preference.entity';
import { FollowsService } from './follows.service';

const LINK_UNKNOWN = 'This link is not known. Sign in to manage your mail on your account page.';

/** A person's mail settings and each follow's delivery; reachable signed in, or signed out with a mail's link. */
@Injectable()
export class MailPreferencesService {
  constructor(
    @InjectRepository(MailPreference) private readonly preferences: Repository<MailPreference>,
    @InjectRepository(Follow) private readonly follows: Repository<Follow>,
    @InjectRepository(FitNewsDelivery) private readonly deliveries: Repository<FitNewsDelivery>,
    @InjectRepository(MailLink) private readonly links: Repository<MailLink>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(Workshop) private readonly workshops: Repository<Workshop>,
    private readonly followsService: FollowsService,
    config: ConfigService<AppConfig, true>,
  ) {
    this.appOrigin = config.get('appOrigin', { infer: true });
  }

  private readonly appOrigin: string;

  /**
   * The links of one "new fit report" mail to a member: a token of its own (kept as its SHA-256) that
   * turns that mail off in one click, and opens the preferences page without signing in.
   */
  async fitReportMailLinks(userId: string): Promise<{ pageUrl: string; oneClickUrl: string; preferencesUrl: string }> {
    const token = newSecretToken();
    await this.links.insert({ tokenHash: hashSecretToken(token), userId, purpose: 'fit_report', cadence: null });
    return {
      pageUrl: `${this.appOrigin}/unsubscribe?token=${token}`,
      oneClickUrl: `${this.appOrigin}/api/follows/unsubscribe?token=${token}`,
      preferencesUrl: `${this.appOrigin}/mail-preferences?token=${token}`,
    };
  }

  /** The person a mail's link (fit-news delivery or digest token) was sent to. */
  async userForLink(token: string): Promise<string> {
    const tokenHash = hashSecretToken(token);
    const delivery = await this.deliveries.findOne({ where: { tokenHash }, select: { userId: true } });
    if (delivery) return delivery.userId;
    const link = await this.links.findOneBy({ tokenHash });
    if (link) return link.userId;
    throw new NotFoundException({ message: LINK_UNKNOWN, code: 'link_unknown' });
  }

  async get(userId: string): Promise<MailPreferencesDto> {
    const user = await this.users.findOneByOrFail({ id: userId });
    const preference = (await this.preferences.findOneBy({ userId })) ?? { ...DEFAULT_MAIL_PREFERENCE, userId };
    const follows = await this.follows.find({ where: { userId }, order: { createdAt: 'ASC' } });
    const workshops = follows.length ? await this.workshops.findBy({ id: In([...new Set(follows.map((follow) => follow.workshopId))]) }) : [];
    return {
      email: user.email,
      timeZone: preference.timeZone,
      digestHour: preference.digestHour,
      digestWeekday: preference.digestWeekday,
      fitReportMail: preference.fitReportMail,
      pausedAt: preference.pausedAt ? preference.pausedAt.toISOString() : null,
      pausedNote: preference.pausedNote,
      follows: await Promise.all(
        follows.map(async (follow) => ({
          id: follow.id,
          targetKind: follow.targetKind,
          label: (await this.followsService.target(follow.targetKind, follow.targetId))?.label ?? '(removed)',
          workshopName: workshops.find((workshop) => workshop.id === follow.workshopId)?.name ?? '',
          delivery: follow.delivery,
        })),
      ),
    };
  }

  async update(userId: string, input: UpdateMailPreferencesDto): Promise<MailPreferencesDto> {
    if (input.timeZone !== undefined && !isTimeZone(input.timeZone)) {
      const message = `timeZone: "${input.timeZone}" is not an IANA time zone (e.g. Europe/Berlin, America/Chicago, UTC)`;
      throw new BadRequestException({ message, errors: { timeZone: message } });
    }
    const mine = new Set((await this.follows.find({ where: { userId }, select: { id: true } })).map((follow) => follow.id));
    const foreign = (input.follows ?? []).find((change) => !mine.has(change.followId));
    if (foreign) {
      const message = `followId: ${foreign.followId} is not one of your follows`;
      throw new NotFoundException({ message, errors: { followId: message }, code: 'reference_not_found' });
    }
    const current = (await this.preferences.findOneBy({ userId })) ?? this.preferences.create({ ...DEFAULT_MAIL_PREFERENCE, userId });
    await this.preferences.manager.transaction(async (manager) => {
      await manager.save(MailPreference, {
        ...current,
        timeZone: input.timeZone ?? current.timeZone,
        digestHour: input.digestHour ?? current.digestHour,
        digestWeekday: input.digestWeekday ?? current.digestWeekday,
        fitReportMail: input.fitReportMail ?? current.fitReportMail,
        ...(input.resume ? { pausedAt: null, pausedNote: null } : {}),
      });
      for (const change of input.follows ?? []) await manager.update(Follow, { id: change.followId, userId }, { delivery: change.delivery });
    });
    return this.get(userId);
  }

  async setDelivery(userId: string, followId: string, delivery: FollowDelivery): Promise<MailPreferencesDto> {
    return this.update(userId, { follows: [{ followId, delivery }] });
  }

  /** Members whose fit-report mail is off (FitReportsService leaves them out). */
  async fitReportMailOff(userIds: string[]): Promise<Set<string>> {
    if (!userIds.length) return new Set();
    const rows = await this.preferences.findBy({ userId: In(userIds), fitReportMail: 'off' });
    const paused = await this.preferences.find({ where: { userId: In(userIds) } });
    return new Set([...rows.map((row) => row.userId), ...paused.filter((row) => row.pausedAt).map((row) => row.userId)]);
  }
}
