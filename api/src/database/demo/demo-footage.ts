import { INestApplicationContext } from '@nestjs/common';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { BuildsService } from '../../builds/builds.service';
import { formatWebVtt } from '../../engine/transcript-formats';
import { FootageService } from '../../footage/footage.service';
import { renderTitleCardVideo, type TitleCard } from '../../infra/media/title-card-video';
import { TranscriptsService } from '../../transcripts/transcripts.service';
import { DEMO_BUILD_TITLE } from './demo-fit-data';

/**
 * The demo build's footage: a narrated title-card walkthrough generated at set-up with ffmpeg (and
 * espeak-ng when installed), with a WebVTT transcript written for it. Everything said is invented
 * for the demo scenario (DESIGN.md); numbers are spoken the way a machinist says them, so the
 * transcript shows what spoken-measurement mining finds. Uploaded through the same presigned
 * multipart path as the studio and processed by the same media job.
 */
export const DEMO_FOOTAGE_TITLE = 'Coupler walkthrough: spline, pilot bore, driveshaft window';
const FILE_NAME = 'coupler-walkthrough.mp4';

export const DEMO_CARDS: TitleCard[] = [
  {
    title: 'Motor-to-gearbox coupler',
    subtitle: 'Compact pickup, electric conversion',
    narration: 'Welcome back to Harrow Lane Garage. Today we prove the motor to gearbox coupler.',
  },
  {
    title: '1 · Coupler spline',
    subtitle: 'HL-2107: 21 teeth, 16/32 pitch',
    narration: 'First, the spline. Our coupler, part H L twenty-one oh seven, has twenty-one teeth at sixteen thirty-two pitch.',
  },
  {
    title: '1 · Coupler spline',
    subtitle: 'Input shaft: 21 teeth · BD-2741: 27 teeth',
    narration: 'The input shaft counts twenty-one teeth too, so it matches. The catalogue coupler a follower sent in has twenty-seven: no fit.',
  },
  {
    title: '2 · End float',
    subtitle: 'Feeler gauge at the motor face',
    narration: 'With the coupler seated, the feeler gauge shows fifteen thousandths of an inch of end float at the motor face.',
  },
  {
    title: '3 · Pilot bearing bore',
    subtitle: 'Bore gauge: 15.008 mm',
    narration: 'Next, the pilot bearing bore. The bore gauge reads fifteen point zero zero eight millimetres.',
  },
  {
    title: '3 · Pilot bearing bore',
    subtitle: 'Pilot nose: 0.5902 in',
    narration: 'The pilot nose on the input shaft mikes at zero point five nine zero two inch.',
  },
  {
    title: '3 · Pilot bearing bore',
    // 15.008 mm − 0.5902 in × 25.4 mm/in = 15.008 − 14.99108 = 0.01692 mm = 0.000666 in, about seven tenths (0.0007 in).
    subtitle: 'About seven tenths of clearance',
    narration: 'That leaves about seven tenths of a thou of clearance: a sliding fit, as H7 over g6 should give.',
  },
  {
    title: '4 · Driveshaft length window',
    subtitle: 'Installed: 530 mm at bump, 555 mm at droop',
    narration: 'Last, the driveshaft window. Installed length is five hundred and thirty millimetres at bump and five hundred and fifty-five at droop.',
  },
  {
    title: '4 · Driveshaft length window',
    subtitle: 'Slip yoke: 520 to 565 mm',
    narration: 'The slip yoke shaft compresses to five twenty and extends to five sixty-five.',
  },
  {
    title: '4 · Driveshaft length window',
    subtitle: '10 mm of plunge margin each way',
    narration: 'That keeps ten millimetres of plunge margin at each end, more than the five we set as our rule.',
  },
  {
    title: 'Fit confirmed',
    subtitle: 'Bolted up, turns freely by hand',
    narration: 'Bolted up on the truck, the input turns freely by hand. Fit confirmed.',
  },
  {
    title: 'Caution',
    subtitle: 'Stands under the truck, high voltage isolated',
    narration: 'Support the truck on stands, and isolate the high voltage battery before you work under it.',
  },
];

interface Ids {
  workshopId: string;
  creatorId: string;
}

/** Where generated media is cached between runs: the profile's data folder (scripts/env.sh), else .data/ at the root. */
function cacheDir(): string {
  const base = process.env.FW_DATA ?? resolve(__dirname, '../../../../.data');
  const dir = join(base, 'demo-media');
  mkdirSync(dir, { recursive: true });
  return dir;
}

/** Generates the clip and its transcript once; later runs reuse them while the script is unchanged. */
async function demoMedia(): Promise<{ video: string; transcript: string; summary: string }> {
  const dir = cacheDir();
  const version = createHash('sha256').update(JSON.stringify(DEMO_CARDS)).digest('hex').slice(0, 12);
  const video = join(dir, `coupler-walkthrough-${version}.mp4`);
  const transcript = join(dir, `coupler-walkthrough-${version}.vtt`);
  if (existsSync(video) && existsSync(transcript) && statSync(video).size > 0) return { video, transcript, summary: `cached in ${dir}` };

  const started = Date.now();
  const work = join(dir, 'work');
  mkdirSync(work, { recursive: true });
  const rendered = await renderTitleCardVideo(DEMO_CARDS, video, work);
  const vtt = formatWebVtt(rendered.cards.map((card) => ({ startMs: card.startMs, endMs: card.endMs, text: card.narration })));
  writeFileSync(transcript, `${vtt.replace(/^WEBVTT\n/u, 'WEBVTT - Harrow Lane Garage demo (invented)\n')}`);
  const summary =
    `generated in ${((Date.now() - started) / 1000).toFixed(1)} s, ${(rendered.durationMs / 1000).toFixed(0)} s long` +
    `${rendered.narrated ? ', narrated with espeak-ng' : ', silent: espeak-ng is not installed'}` +
    `${rendered.lettered ? '' : ', test pattern: no font for the title cards'}`;
  return { video, transcript, summary };
}

/** Uploads a local file the way the studio does: presigned part URLs, PUT each part, record its ETag, complete. */
async function uploadLikeTheStudio(footage: FootageService, ids: Ids, buildId: string, file: string): Promise<string> {
  const bytes = readFileSync(file);
  const created = await footage.create(ids.workshopId, buildId, ids.creatorId, {
    fileName: FILE_NAME,
    contentType: 'video/mp4',
    sizeBytes: bytes.length,
    title: DEMO_FOOTAGE_TITLE,
  });
  const { partSizeBytes, partCount } = created.upload;
  const numbers = Array.from({ length: partCount }, (_, index) => index + 1);
  const { urls } = await footage.signPartUrls(ids.workshopId, created.footage.id, numbers);
  for (const { partNumber, url } of urls) {
    const response = await fetch(url, { method: 'PUT', body: bytes.subarray((partNumber - 1) * partSizeBytes, partNumber * partSizeBytes) });
    const etag = response.headers.get('etag');
    if (!response.ok || !etag) throw new Error(`storage refused demo part ${partNumber}: ${response.status}`);
    await footage.recordPart(ids.workshopId, created.footage.id, partNumber, etag);
  }
  await footage.complete(ids.workshopId, created.footage.id);
  return created.footage.id;
}

/** Waits for the media job (this process works the queue too) to finish with the footage. */
async function waitForProcessing(footage: FootageService, workshopId: string, footageId: string): Promise<'ready' | 'failed'> {
  const deadline = Date.now() + 120_000;
  while (Date.now() < deadline) {
    const { state } = await footage.get(workshopId, footageId);
    if (state === 'ready' || state === 'failed') return state;
    await new Promise((done) => setTimeout(done, 250));
  }
  throw new Error('the demo footage was not processed within two minutes; is Redis up?');
}

/** Waits for the web renditions (HLS, MP4, scrub previews, waveform) the same media queue makes after probing. */
async function waitForRenditions(footage: FootageService, workshopId: string, footageId: string): Promise<string> {
  const deadline = Date.now() + 600_000;
  while (Date.now() < deadline) {
    const { renditions } = await footage.describe(await footage.get(workshopId, footageId));
    if (renditions.state === 'ready') return `web renditions ${renditions.variants.map(({ height }) => `${height}p`).join(', ')}`;
    if (renditions.state === 'failed') return `web renditions failed: ${renditions.reason}`;
    await new Promise((done) => setTimeout(done, 500));
  }
  return 'web renditions still being made; the server finishes them';
}

/** Idempotent: makes sure the demo build has its walkthrough, processed, with its transcript. */
export async function loadDemoFootage(app: INestApplicationContext, ids: Ids): Promise<string> {
  const builds = app.get(BuildsService);
  const footage = app.get(FootageService);
  const transcripts = app.get(TranscriptsService);
  const build = (await builds.list(ids.workshopId)).find((candidate) => candidate.title === DEMO_BUILD_TITLE);
  if (!build) return 'demo footage skipped: the demo build is missing';

  let existing = (await footage.list(ids.workshopId, build.id)).find((item) => item.title === DEMO_FOOTAGE_TITLE);
  if (existing && (existing.state === 'uploading' || existing.state === 'failed')) {
    // A run that stopped half-way: start that footage again.
    await footage.remove(ids.workshopId, existing.id);
    existing = undefined;
  }
  if (existing?.state === 'ready' && existing.transcript) {
    return 'demo footage already loaded';
  }

  const media = await demoMedia();
  const footageId = existing?.id ?? (await uploadLikeTheStudio(footage, ids, build.id, media.video));
  const state = await waitForProcessing(footage, ids.workshopId, footageId);
  if (state === 'failed') {
    const { failureReason } = await footage.get(ids.workshopId, footageId);
    throw new Error(`the demo footage failed processing: ${failureReason}`);
  }
  await transcripts.attach(ids.workshopId, footageId, ids.creatorId, {
    text: readFileSync(media.transcript, 'utf8'),
    format: 'webvtt',
    fileName: 'coupler-walkthrough.vtt',
  });
  const renditions = await waitForRenditions(footage, ids.workshopId, footageId);
  return `demo footage "${DEMO_FOOTAGE_TITLE}" uploaded, processed and transcribed (${media.summary}; ${renditions})`;
}
