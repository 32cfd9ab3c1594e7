import { MixedList } from 'typeorm';
import { Accounts1764600000000 } from './1764600000000-accounts';
import { FitData1764700000000 } from './1764700000000-fit-data';
import { Footage1764840000000 } from './1764840000000-footage';
import { Marks1764900000000 } from './1764900000000-marks';
import { MarkEvidence1764900000001 } from './1764900000001-mark-evidence';
import { Guides1765000000000 } from './1765000000000-guides';
import { Follows1765100000000 } from './1765100000000-follows';
import { FitReports1765200000000 } from './1765200000000-fit-reports';
import { FitNewsUnsubscribe1765310000000 } from './1765310000000-fit-news-unsubscribe';
import { PublishedGuidesIndex1765320000000 } from './1765320000000-published-guides-index';
import { FootageRenditions1765410000000 } from './1765410000000-footage-renditions';
import { FitFinder1765430000000 } from './1765430000000-fit-finder';
import { Search1765440000000 } from './1765440000000-search';
import { SearchPublicParts1765440000001 } from './1765440000001-search-public-parts';
import { MailOutbox1765450000000 } from './1765450000000-mail-outbox';
import { MailPreferences1765450000001 } from './1765450000001-mail-preferences';
import { FitReportMailLinks1765460000000 } from './1765460000000-fit-report-mail-links';
import { GuideEffort1765466000000 } from './1765466000000-guide-effort';
import { MailAttempts1765470000000 } from './1765470000000-mail-attempts';
import { GuideReads1765480000000 } from './1765480000000-guide-reads';
import { FinderSplinePitch1765486000000 } from './1765486000000-finder-spline-pitch';
import { InvitationOptOuts1765490000000 } from './1765490000000-invitation-opt-outs';

/** Every migration, oldest first. Listed explicitly so the same list works from src (tests) and dist. */
// eslint-disable-next-line @typescript-eslint/no-unsafe-function-type
export const migrations: MixedList<Function> = [
  Accounts1764600000000,
  FitData1764700000000,
  Footage1764840000000,
  Marks1764900000000,
  MarkEvidence1764900000001,
  Guides1765000000000,
  Follows1765100000000,
  FitReports1765200000000,
  FitNewsUnsubscribe1765310000000,
  PublishedGuidesIndex1765320000000,
  FootageRenditions1765410000000,
  FitFinder1765430000000,
  Search1765440000000,
  SearchPublicParts1765440000001,
  MailOutbox1765450000000,
  MailPreferences1765450000001,
  FitReportMailLinks1765460000000,
  GuideEffort1765466000000,
  MailAttempts1765470000000,
  GuideReads1765480000000,
  FinderSplinePitch1765486000000,
  InvitationOptOuts1765490000000,
];
