import { NestExpressApplication } from '@nestjs/platform-express';
import { execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { Parser } from 'm3u8-parser';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { MEDIA_JOBS, type ProcessFootageJob } from '../src/footage/footage-jobs';
import { type JobQueue, jobQueueToken } from '../src/infra/jobs/job-queue';
import { QUEUES } from '../src/infra/jobs/queues';
import { StorageService } from '../src/infra/storage/storage.service';
import { createTestApp } from './create-test-app';
import { signUpAndSignIn, TestAccount, uniqueSlug } from './support/accounts';
import { type FootageBody, makeClip, removeScratch, scratchDir, startUpload, uploadFile, uploadParts, waitUntilProcessed } from './support/footage';

jest.setTimeout(300_000);

/**
 * The media pipeline end to end: real ffmpeg, the S3 fake, MariaDB and Redis. Every input is made
 * here with ffmpeg (tiny and short: the box has two cores) and every output is checked with ffprobe
 * and an HLS playlist parser (m3u8-parser), as a player would read it.
 */

interface Renditions {
  state: 'waiting' | 'processing' | 'ready' | 'failed';
  percent: number | null;
  secondsLeft: number | null;
  reason: string | null;
  variants: { width: number; height: number; bandwidth: number }[];
}
type FootageWithRenditions = FootageBody & { renditions: Renditions; displayWidth: number | null; displayHeight: number | null };

interface ProbeStream {
  codec_type: string;
  codec_name: string;
  profile?: string;
  pix_fmt?: string;
  width?: number;
  height?: number;
  r_frame_rate?: string;
  avg_frame_rate?: string;
  side_data_list?: { rotation?: number }[];
}

const HLS_INPUT = ['-protocol_whitelist', 'file,http,https,tcp,tls,crypto', '-allowed_extensions', 'ALL'];

function ffprobe(input: string, extra: string[] = []): { streams: ProbeStream[]; format: { duration: string } } {
  const json = execFileSync('ffprobe', ['-v', 'error', ...extra, '-print_format', 'json', '-show_format', '-show_streams', input], { encoding: 'utf8' });
  return JSON.parse(json) as { streams: ProbeStream[]; format: { duration: string } };
}

function keyframeTimes(input: string, extra: string[] = []): number[] {
  const csv = execFileSync(
    'ffprobe',
    ['-v', 'error', ...extra, '-select_streams', 'v:0', '-show_entries', 'packet=pts_time,flags', '-of', 'csv=p=0', input],
    { encoding: 'utf8' },
  );
  return csv
    .split('\n')
    .filter((line) => line.includes('K'))
    .map((line) => Number(line.split(',')[0]));
}

function ffmpeg(args: string[]): void {
  execFileSync('ffmpeg', ['-v', 'error', '-y', ...args]);
}

function parsePlaylist(text: string) {
  const parser = new Parser();
  parser.push(text);
  parser.end();
  return parser.manifest;
}

describe('footage renditions: HLS, MP4, scrub previews and waveform (real ffmpeg, S3 fake, MariaDB)', () => {
  let app: NestExpressApplication;
  let storage: StorageService;
  let db: DataSource;
  let owner: TestAccount;
  let workshopId: string;
  let workshopSlug: string;
  let buildId: string;

  beforeAll(async () => {
    app = await createTestApp();
    storage = app.get(StorageService);
    db = app.get(DataSource);
    owner = await signUpAndSignIn(app, { displayName: 'Rowan Avery' });
    workshopSlug = uniqueSlug('renditions');
    const workshop = await owner.agent.post('/api/workshops').send({ name: 'Harrow Lane Garage', slug: workshopSlug }).expect(201);
    workshopId = workshop.body.id;
    const build = await owner.agent.post(`/api/workshops/${workshopId}/builds`).send({ title: 'Motor-to-gearbox coupler' }).expect(201);
    buildId = build.body.id;
  });
  afterAll(async () => {
    removeScratch();
    await app.close();
  });

  const footageUrl = (footageId: string, suffix = '') => `/api/workshops/${workshopId}/footage/${footageId}${suffix}`;

  async function waitForRenditions(footageId: string, timeoutMs = 180_000): Promise<FootageWithRenditions> {
    const deadline = Date.now() + timeoutMs;
    await waitUntilProcessed(owner.agent, workshopId, footageId, timeoutMs);
    for (;;) {
      const footage = (await owner.agent.get(footageUrl(footageId)).expect(200)).body as FootageWithRenditions;
      if (footage.renditions.state === 'ready' || footage.renditions.state === 'failed') return footage;
      if (Date.now() > deadline) throw new Error(`renditions of ${footageId} still ${footage.renditions.state}`);
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
  }

  /** The studio's upload path; a .mov goes up as video/quicktime, as a browser labels it. */
  async function upload(file: string): Promise<string> {
    if (!file.endsWith('.mov')) return uploadFile(owner.agent, workshopId, buildId, file);
    const plan = await startUpload(owner.agent, workshopId, buildId, file, file.split('/').pop(), 'video/quicktime');
    await uploadParts(owner.agent, workshopId, plan, file, Array.from({ length: plan.partCount }, (_unused, index) => index + 1));
    await owner.agent.post(footageUrl(plan.footageId, '/upload/complete')).expect(200);
    return plan.footageId;
  }

  /** Writes a variant playlist as the API serves it to a file, so ffprobe follows its segment links. */
  async function variantFile(footageId: string, index: number): Promise<string> {
    const response = await owner.agent.get(footageUrl(footageId, `/hls/v${index}.m3u8`)).expect(200);
    expect(response.headers['content-type']).toMatch(/application\/vnd\.apple\.mpegurl/);
    const file = join(scratchDir(), `${footageId}-v${index}.m3u8`);
    writeFileSync(file, response.text);
    return file;
  }

  /** Checks one rendition as a player reads it: codecs, size, duration, and a keyframe at every segment start. */
  async function checkRendition(footageId: string, index: number, expected: { width: number; height: number; durationSeconds: number }) {
    const file = await variantFile(footageId, index);
    const manifest = parsePlaylist(readFileSync(file, 'utf8'));
    expect(manifest.endList).toBe(true);
    expect(manifest.segments.length).toBeGreaterThan(0);
    // Segments of 4 s (the last may be shorter); RFC 8216 §4.3.3.1: no EXTINF above the target duration.
    for (const segment of manifest.segments.slice(0, -1)) expect(segment.duration).toBeCloseTo(4, 1);
    for (const segment of manifest.segments) {
      expect(Math.round(segment.duration)).toBeLessThanOrEqual(manifest.targetDuration ?? 0);
      expect(segment.uri).toMatch(/^http:\/\/.+\/seg-\d{5}\.m4s\?.*X-Amz-Signature=/);
      expect(segment.map?.uri).toMatch(/^http:\/\/.+\/init(_\d)?\.mp4\?/);
    }
    const probe = ffprobe(file, HLS_INPUT);
    const video = probe.streams.find((stream) => stream.codec_type === 'video');
    const audio = probe.streams.find((stream) => stream.codec_type === 'audio');
    expect(video).toMatchObject({ codec_name: 'h264', profile: 'High', pix_fmt: 'yuv420p', width: expected.width, height: expected.height });
    expect(video?.side_data_list ?? []).toEqual([]);
    expect(audio).toMatchObject({ codec_name: 'aac' });
    expect(Math.abs(Number(probe.format.duration) - expected.durationSeconds)).toBeLessThanOrEqual(0.1);

    const keyframes = keyframeTimes(file, HLS_INPUT);
    const first = keyframes[0];
    let start = 0;
    for (const segment of manifest.segments) {
      expect(keyframes.some((time) => Math.abs(time - first - start) < 0.02)).toBe(true);
      start += segment.duration;
    }
    return { manifest, probe };
  }

  function sourceSeconds(file: string): number {
    return Number(ffprobe(file).format.duration);
  }

  it('turns an HEVC 10-bit .mov into H.264 High / AAC renditions at 720p and 360p, HLS with aligned keyframes, a faststart MP4, sprites and a waveform', async () => {
    const source = join(scratchDir(), 'phone-hevc.mov');
    ffmpeg([
      '-f', 'lavfi', '-i', 'testsrc2=duration=5:size=1280x720:rate=25',
      '-f', 'lavfi', '-i', 'sine=frequency=220:duration=5',
      '-c:v', 'libx265', '-preset', 'ultrafast', '-x265-params', 'log-level=error', '-pix_fmt', 'yuv420p10le', '-tag:v', 'hvc1',
      '-c:a', 'aac', '-shortest', source,
    ]);
    const footageId = await upload(source);
    const footage = await waitForRenditions(footageId);
    expect(footage).toMatchObject({ state: 'ready', videoCodec: 'hevc', container: 'mov', displayWidth: 1280, displayHeight: 720 });
    expect(footage.renditions).toMatchObject({ state: 'ready', percent: 100, secondsLeft: null, reason: null });
    expect(footage.renditions.variants.map(({ width, height }) => `${width}x${height}`)).toEqual(['1280x720', '640x360']);

    const playback = (await owner.agent.get(footageUrl(footageId, '/playback')).expect(200)).body;
    expect(playback).toMatchObject({
      hlsUrl: `/api/workshops/${workshopId}/footage/${footageId}/hls/master.m3u8`,
      thumbnailsUrl: `/api/workshops/${workshopId}/footage/${footageId}/thumbnails.vtt`,
      waveformUrl: `/api/workshops/${workshopId}/footage/${footageId}/waveform`,
      displayWidth: 1280,
      displayHeight: 720,
      contentType: 'video/mp4',
    });
    expect(playback.url).toBe(playback.mp4Url);

    const master = await owner.agent.get(playback.hlsUrl).expect(200);
    const masterManifest = parsePlaylist(master.text);
    expect(masterManifest.playlists?.map((playlist) => playlist.uri)).toEqual([
      `/api/workshops/${workshopId}/footage/${footageId}/hls/v0.m3u8`,
      `/api/workshops/${workshopId}/footage/${footageId}/hls/v1.m3u8`,
    ]);
    expect(masterManifest.playlists?.map((playlist) => playlist.attributes.RESOLUTION)).toEqual([
      { width: 1280, height: 720 },
      { width: 640, height: 360 },
    ]);
    expect(master.text).not.toMatch(/X-Amz/);

    const seconds = sourceSeconds(source);
    await checkRendition(footageId, 0, { width: 1280, height: 720, durationSeconds: seconds });
    await checkRendition(footageId, 1, { width: 640, height: 360, durationSeconds: seconds });
    await owner.agent.get(footageUrl(footageId, '/hls/v2.m3u8')).expect(404);

    // The download MP4: H.264/AAC with its index (moov) before the media data (faststart).
    const mp4 = Buffer.from(await (await fetch(playback.mp4Url as string)).arrayBuffer());
    const mp4File = join(scratchDir(), 'download.mp4');
    writeFileSync(mp4File, mp4);
    expect(mp4.indexOf('moov')).toBeLessThan(mp4.indexOf('mdat'));
    const mp4Probe = ffprobe(mp4File);
    expect(mp4Probe.streams.map((stream) => stream.codec_name).sort()).toEqual(['aac', 'h264']);
    expect(Math.abs(Number(mp4Probe.format.duration) - seconds)).toBeLessThanOrEqual(0.1);

    // Scrub previews: a thumbnail every 2 s, each cue a sprite-sheet link with a #xywh fragment.
    const track = await owner.agent.get(playback.thumbnailsUrl).expect(200);
    expect(track.headers['content-type']).toMatch(/^text\/vtt/);
    const cues = track.text.split('\n\n').slice(1).filter((cue) => cue.trim() !== '');
    expect(cues.map((cue) => cue.split('\n')[0])).toEqual([
      '00:00:00.000 --> 00:00:02.000',
      '00:00:02.000 --> 00:00:04.000',
      '00:00:04.000 --> 00:00:05.000',
    ]);
    expect(cues[1].split('\n')[1]).toMatch(/^http:\/\/.+\/sprite-01\.jpg\?.+#xywh=160,0,160,90$/);
    const sheet = await fetch(cues[0].split('\n')[1].replace(/#.*$/, ''));
    expect(sheet.status).toBe(200);
    expect(sheet.headers.get('content-type')).toBe('image/jpeg');
    const sheetFile = join(scratchDir(), 'sheet.jpg');
    writeFileSync(sheetFile, Buffer.from(await sheet.arrayBuffer()));
    expect(ffprobe(sheetFile).streams[0]).toMatchObject({ width: 1600, height: 900 });

    // The waveform: 20 peaks a second of a steady sine, so every full bucket is loud.
    const waveform = (await owner.agent.get(playback.waveformUrl).expect(200)).body;
    expect(waveform).toMatchObject({ hasAudio: true, peaksPerSecond: 20 });
    expect(waveform.peaks.length).toBeGreaterThanOrEqual(99);
    expect(waveform.peaks.length).toBeLessThanOrEqual(101);
    expect(Math.min(...waveform.peaks.slice(2, 90))).toBeGreaterThan(0.05);
    expect(Math.max(...waveform.peaks)).toBeLessThanOrEqual(1);
  });

  it('applies rotation metadata, so a portrait phone clip stays portrait', async () => {
    const landscape = makeClip('sideways.mp4', { seconds: 2, width: 640, height: 360 });
    const portrait = join(scratchDir(), 'portrait.mp4');
    ffmpeg(['-i', landscape, '-c', 'copy', '-metadata:s:v:0', 'rotate=90', portrait]);
    expect(ffprobe(portrait).streams[0].side_data_list?.[0]?.rotation).toBeDefined();
    const footageId = await upload(portrait);
    const footage = await waitForRenditions(footageId);
    expect(footage).toMatchObject({ displayWidth: 360, displayHeight: 640 });
    expect(footage.renditions.variants.map(({ width, height }) => `${width}x${height}`)).toEqual(['360x640']);
    await checkRendition(footageId, 0, { width: 360, height: 640, durationSeconds: sourceSeconds(portrait) });
    const track = await owner.agent.get(footageUrl(footageId, '/thumbnails.vtt')).expect(200);
    expect(track.text).toMatch(/#xywh=0,0,160,284$/m);
  });

  it('makes a variable-frame-rate clip constant', async () => {
    const vfr = join(scratchDir(), 'vfr.mp4');
    // Frames dropped unevenly and kept with their times (-vsync vfr): the rate varies across the clip.
    ffmpeg([
      '-f', 'lavfi', '-i', 'testsrc=duration=4:size=320x240:rate=30',
      '-f', 'lavfi', '-i', 'sine=duration=4',
      '-vf', "select='lt(n,30)+not(mod(n,3))'", '-vsync', 'vfr', '-c:v', 'libx264', '-c:a', 'aac', '-shortest', vfr,
    ]);
    const sourceVideo = ffprobe(vfr).streams.find((stream) => stream.codec_type === 'video');
    expect(sourceVideo?.avg_frame_rate).not.toBe(sourceVideo?.r_frame_rate);
    const footageId = await upload(vfr);
    await waitForRenditions(footageId);
    const file = await variantFile(footageId, 0);
    const csv = execFileSync('ffprobe', ['-v', 'error', ...HLS_INPUT, '-select_streams', 'v:0', '-show_entries', 'packet=duration_time', '-of', 'csv=p=0', file], {
      encoding: 'utf8',
    });
    const durations = new Set(csv.split('\n').filter((line) => line.trim() !== '').map((line) => Number(line).toFixed(4)));
    expect([...durations]).toHaveLength(1);
    const { probe } = await checkRendition(footageId, 0, { width: 320, height: 240, durationSeconds: sourceSeconds(vfr) });
    const video = probe.streams.find((stream) => stream.codec_type === 'video');
    // One standard rate throughout, the one nearest the source's average.
    expect(video?.avg_frame_rate).toBe(video?.r_frame_rate);
    expect(['24000/1001', '24/1', '25/1', '30000/1001', '30/1']).toContain(video?.avg_frame_rate);
  });

  it('gives a clip without audio a silent AAC track in every rendition, and a flat waveform', async () => {
    const silent = join(scratchDir(), 'no-audio.mp4');
    ffmpeg(['-f', 'lavfi', '-i', 'testsrc=duration=3:size=640x360:rate=25', '-c:v', 'libx264', '-pix_fmt', 'yuv420p', silent]);
    const footageId = await upload(silent);
    const footage = await waitForRenditions(footageId);
    expect(footage.audioCodec).toBeNull();
    expect(footage.renditions.state).toBe('ready');
    await checkRendition(footageId, 0, { width: 640, height: 360, durationSeconds: sourceSeconds(silent) });
    const waveform = (await owner.agent.get(footageUrl(footageId, '/waveform')).expect(200)).body;
    expect(waveform.hasAudio).toBe(false);
    expect(waveform.peaks.length).toBeGreaterThan(50);
    expect(waveform.peaks.every((peak: number) => peak === 0)).toBe(true);
  });

  it('caps a short 4K clip at 1080p with 720p and 360p below', async () => {
    const uhd = join(scratchDir(), 'uhd.mp4');
    ffmpeg([
      '-f', 'lavfi', '-i', 'testsrc2=duration=1:size=3840x2160:rate=10',
      '-f', 'lavfi', '-i', 'sine=duration=1',
      '-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p', '-c:a', 'aac', '-shortest', uhd,
    ]);
    const footageId = await upload(uhd);
    const footage = await waitForRenditions(footageId);
    expect(footage.renditions.variants.map(({ width, height }) => `${width}x${height}`)).toEqual(['1920x1080', '1280x720', '640x360']);
    const seconds = sourceSeconds(uhd);
    await checkRendition(footageId, 0, { width: 1920, height: 1080, durationSeconds: seconds });
    await checkRendition(footageId, 2, { width: 640, height: 360, durationSeconds: seconds });
  });

  describe('a source cut short', () => {
    let footageId: string;
    let objectKey: string;

    it('fails the renditions with a plain reason, keeps the original and the footage playable', async () => {
      const whole = makeClip('whole.mp4', { seconds: 6 });
      const truncated = join(scratchDir(), 'cut-short.mp4');
      // The index sits up front (faststart), so the file probes as 6 s but the media data stops early.
      writeFileSync(truncated, readFileSync(whole).subarray(0, 60_000));
      footageId = await upload(truncated);
      const footage = await waitForRenditions(footageId);
      expect(footage.state).toBe('ready');
      expect(footage.renditions.state).toBe('failed');
      expect(footage.renditions.reason).toMatch(/^The video ends early: only \d+\.\d s of its 6\.0 s could be read .*The original is kept\.$/);
      expect(footage.renditions.reason).not.toMatch(/X-Amz|http/);
      [{ object_key: objectKey }] = await db.query('SELECT object_key FROM footage WHERE id = ?', [footageId]);
      expect(await storage.headObject(objectKey)).not.toBeNull();
      expect(await storage.listKeys(objectKey.replace(/original\.mp4$/, 'web/'))).toEqual([]);
      const playback = (await owner.agent.get(footageUrl(footageId, '/playback')).expect(200)).body;
      expect(playback).toMatchObject({ hlsUrl: null, mp4Url: null, thumbnailsUrl: null, waveformUrl: null, contentType: 'video/mp4' });
      expect(playback.url).toContain('original.mp4');
      await owner.agent.get(footageUrl(footageId, '/hls/master.m3u8')).expect(404);
    });

    it('retries on request, and fails the same way again', async () => {
      const retried = await owner.agent.post(footageUrl(footageId, '/renditions/retry')).expect(200);
      expect(retried.body.renditions).toMatchObject({ state: 'waiting', reason: null });
      const twice = await owner.agent.post(footageUrl(footageId, '/renditions/retry')).expect(409);
      expect(twice.body.message).toMatch(/already being made/);
      const footage = await waitForRenditions(footageId);
      expect(footage.renditions.state).toBe('failed');
      expect(await storage.headObject(objectKey)).not.toBeNull();
    });
  });

  describe('retry, deletion, keep or drop originals, the public guide', () => {
    let footageId: string;
    let folder: string;

    it('re-runs idempotently: leftovers of an interrupted run are replaced, nothing is doubled', async () => {
      const clip = makeClip('twice.mp4', { seconds: 5, width: 640, height: 360 });
      footageId = await upload(clip);
      await waitForRenditions(footageId);
      const [{ object_key: objectKey }] = await db.query('SELECT object_key FROM footage WHERE id = ?', [footageId]);
      folder = objectKey.replace(/original\.mp4$/, '');
      const before = (await storage.listKeys(`${folder}web/`)).sort();
      expect(before).toEqual(
        expect.arrayContaining([`${folder}web/master.m3u8`, `${folder}web/v0/index.m3u8`, `${folder}web/v0/init.mp4`, `${folder}web/v0/seg-00001.m4s`, `${folder}web/download.mp4`, `${folder}web/waveform.json`, `${folder}web/sprite-01.jpg`]),
      );
      expect(before.some((key) => key.endsWith('audio.pcm'))).toBe(false);
      // What a run stopped half-way would leave: a segment no playlist names.
      await storage.putObject(`${folder}web/v0/seg-09999.m4s`, Buffer.from('partial'), 'video/iso.segment');

      const retried = await owner.agent.post(footageUrl(footageId, '/renditions/retry')).expect(200);
      // Queued, or already claimed by this process's worker when the answer was read.
      expect(['waiting', 'processing']).toContain(retried.body.renditions.state);
      const again = await waitForRenditions(footageId);
      expect(again.renditions.state).toBe('ready');
      expect((await storage.listKeys(`${folder}web/`)).sort()).toEqual(before);
      const [{ n }] = await db.query('SELECT COUNT(*) AS n FROM footage WHERE id = ?', [footageId]);
      expect(Number(n)).toBe(1);
    });

    it('queues the transcode when a probing job runs again after its process stopped before queuing it', async () => {
      const listing = (await storage.listKeys(`${folder}web/`)).sort();
      // What an API stopped mid-job leaves: the footage probed and ready, its renditions waiting, no transcode queued;
      // Bull then runs the probing job again in another process.
      await db.query("UPDATE footage SET renditions_state = 'waiting' WHERE id = ?", [footageId]);
      const media = app.get<JobQueue<ProcessFootageJob>>(jobQueueToken(QUEUES.media));
      await media.enqueue(MEDIA_JOBS.processFootage, { footageId }, { jobId: `process-footage-${footageId}-again` });
      const footage = await waitForRenditions(footageId, 120_000);
      expect(footage.renditions.state).toBe('ready');
      expect((await storage.listKeys(`${folder}web/`)).sort()).toEqual(listing);
    });

    it('keeps renditions and their retry to the workshop: 404 to non-members, 401 signed out', async () => {
      const stranger = await signUpAndSignIn(app, { displayName: 'Sam Stranger' });
      await stranger.agent.post(footageUrl(footageId, '/renditions/retry')).expect(404);
      await request(app.getHttpServer()).get(footageUrl(footageId, '/hls/master.m3u8')).expect(401);
    });

    it('serves the renditions of a published guide to anyone, and stops when the guide is withdrawn', async () => {
      const base = `/api/workshops/${workshopId}`;
      const guide = await owner.agent.post(`${base}/builds/${buildId}/guides`).send({ title: 'Seating the coupler', footageId }).expect(201);
      await owner.agent.post(`${base}/guides/${guide.body.id}/steps`).send({ title: 'Slide the coupler on', startMs: 1000 }).expect(201);
      await owner.agent.post(`${base}/guides/${guide.body.id}/revisions`).send({}).expect(201);
      const publicBase = `/api/guides/${workshopSlug}/${guide.body.slug}`;
      const anyone = request(app.getHttpServer());

      const read = await anyone.get(publicBase).expect(200);
      expect(read.body.footage).toMatchObject({
        videoUrl: `${publicBase}/video`,
        mp4Url: `${publicBase}/video`,
        hlsUrl: `${publicBase}/hls/master.m3u8`,
        thumbnailsUrl: `${publicBase}/thumbnails.vtt`,
        waveformUrl: `${publicBase}/waveform`,
        displayWidth: 640,
        displayHeight: 360,
      });
      const master = await anyone.get(`${publicBase}/hls/master.m3u8`).expect(200);
      expect(parsePlaylist(master.text).playlists?.map((playlist) => playlist.uri)).toEqual([`${publicBase}/hls/v0.m3u8`]);
      const variant = await anyone.get(`${publicBase}/hls/v0.m3u8`).expect(200);
      const segments = parsePlaylist(variant.text).segments;
      expect((await fetch(segments[0].uri)).status).toBe(200);
      expect((await fetch(segments[0].map?.uri ?? '')).status).toBe(200);
      expect((await anyone.get(`${publicBase}/thumbnails.vtt`).expect(200)).text).toMatch(/^WEBVTT\n/);
      expect((await anyone.get(`${publicBase}/waveform`).expect(200)).body.hasAudio).toBe(true);
      const video = await anyone.get(`${publicBase}/video`).expect(302);
      expect(video.headers.location).toContain('/web/download.mp4');

      await owner.agent.delete(`${base}/guides/${guide.body.id}/publication`).expect(204);
      for (const path of ['/hls/master.m3u8', '/hls/v0.m3u8', '/thumbnails.vtt', '/waveform', '/video']) {
        await anyone.get(`${publicBase}${path}`).expect(404);
      }
    });

    it('deletes every rendition, segment, sprite and waveform with the footage (as the S3 fake lists them)', async () => {
      const stored = await storage.listKeys(folder);
      expect(stored).toEqual(expect.arrayContaining([`${folder}original.mp4`, `${folder}poster.jpg`, `${folder}web/v0/seg-00000.m4s`, `${folder}web/sprite-01.jpg`]));
      await owner.agent.delete(footageUrl(footageId)).expect(204);
      expect(await storage.listKeys(folder)).toEqual([]);
    });

    it('drops the original after transcoding when the workshop asks, and plays the MP4 rendition instead', async () => {
      expect((await owner.agent.get(`/api/workshops/${workshopId}/media-settings`).expect(200)).body).toEqual({ keepOriginals: true });
      await owner.agent.put(`/api/workshops/${workshopId}/media-settings`).send({ keepOriginals: 'no' }).expect(400);
      await owner.agent.put(`/api/workshops/${workshopId}/media-settings`).send({ keepOriginals: false }).expect(200, { keepOriginals: false });
      try {
        const clip = makeClip('dropped.mp4', { seconds: 2 });
        const dropped = await upload(clip);
        const footage = await waitForRenditions(dropped);
        expect(footage).toMatchObject({ originalKept: false, state: 'ready' });
        const [{ object_key: objectKey }] = await db.query('SELECT object_key FROM footage WHERE id = ?', [dropped]);
        expect(await storage.headObject(objectKey)).toBeNull();
        const playback = (await owner.agent.get(footageUrl(dropped, '/playback')).expect(200)).body;
        expect(playback.url).toContain('/web/download.mp4');
        expect((await fetch(playback.url)).status).toBe(200);
        const refused = await owner.agent.post(footageUrl(dropped, '/renditions/retry')).expect(409);
        expect(refused.body.message).toMatch(/original was dropped/);
      } finally {
        await owner.agent.put(`/api/workshops/${workshopId}/media-settings`).send({ keepOriginals: true }).expect(200);
      }
    });
  });
});
