import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Agent } from './accounts';

/**
 * Footage helpers for e2e tests: clips made with Debian's ffmpeg on the spot (never real footage),
 * and the browser's upload path driven from the test: create, presigned part PUTs with fetch,
 * record each ETag, complete.
 */

let scratch: string | undefined;
export function scratchDir(): string {
  scratch ??= mkdtempSync(join(tmpdir(), 'fitwright-footage-'));
  return scratch;
}

/** Call from afterAll: removes the clips this test file made. */
export function removeScratch(): void {
  if (scratch) rmSync(scratch, { recursive: true, force: true });
  scratch = undefined;
}

export interface ClipOptions {
  seconds?: number;
  width?: number;
  height?: number;
  rate?: number;
  /** Lossless H.264 of a busy test pattern: large files fast, for multi-part uploads. */
  large?: boolean;
}

/** A small MP4 (H.264 + AAC) test pattern, made with ffmpeg as STACK.md describes. */
export function makeClip(name: string, options: ClipOptions = {}): string {
  const { seconds = 3, width = 320, height = 240, rate = 25, large = false } = options;
  const file = join(scratchDir(), name);
  const pattern = large ? 'testsrc2' : 'testsrc';
  execFileSync('ffmpeg', [
    '-v', 'error', '-y',
    '-f', 'lavfi', '-i', `${pattern}=duration=${seconds}:size=${width}x${height}:rate=${rate}`,
    '-f', 'lavfi', '-i', `sine=frequency=440:duration=${seconds}`,
    '-c:v', 'libx264', ...(large ? ['-preset', 'ultrafast', '-qp', '0'] : []),
    '-pix_fmt', 'yuv420p', '-c:a', 'aac', '-shortest', '-movflags', '+faststart',
    file,
  ]);
  return file;
}

export interface UploadPlan {
  footageId: string;
  partSizeBytes: number;
  partCount: number;
}

export async function startUpload(
  agent: Agent,
  workshopId: string,
  buildId: string,
  file: string,
  fileName = file.split('/').pop() ?? 'clip.mp4',
  contentType = 'video/mp4',
): Promise<UploadPlan> {
  const response = await agent
    .post(`/api/workshops/${workshopId}/builds/${buildId}/footage`)
    .send({ fileName, contentType, sizeBytes: statSync(file).size })
    .expect(201);
  return {
    footageId: response.body.footage.id,
    partSizeBytes: response.body.upload.partSizeBytes,
    partCount: response.body.upload.partCount,
  };
}

/** Sends the given parts straight to storage with presigned URLs, as the studio does, and records each ETag. */
export async function uploadParts(agent: Agent, workshopId: string, plan: UploadPlan, file: string, partNumbers: number[]): Promise<void> {
  const bytes = readFileSync(file);
  const signed = await agent
    .post(`/api/workshops/${workshopId}/footage/${plan.footageId}/upload/part-urls`)
    .send({ partNumbers })
    .expect(200);
  for (const { partNumber, url } of signed.body.urls as { partNumber: number; url: string }[]) {
    const body = bytes.subarray((partNumber - 1) * plan.partSizeBytes, partNumber * plan.partSizeBytes);
    const put = await fetch(url, { method: 'PUT', body });
    if (!put.ok) throw new Error(`storage answered ${put.status} to part ${partNumber}: ${await put.text()}`);
    const etag = put.headers.get('etag');
    if (!etag) throw new Error(`storage sent no ETag for part ${partNumber}`);
    await agent
      .put(`/api/workshops/${workshopId}/footage/${plan.footageId}/upload/parts/${partNumber}`)
      .send({ etag })
      .expect(200);
  }
}

/** The whole browser path: create, every part, complete. Returns the footage id. */
export async function uploadFile(agent: Agent, workshopId: string, buildId: string, file: string, fileName?: string): Promise<string> {
  const plan = await startUpload(agent, workshopId, buildId, file, fileName);
  const all = Array.from({ length: plan.partCount }, (_, index) => index + 1);
  await uploadParts(agent, workshopId, plan, file, all);
  await agent.post(`/api/workshops/${workshopId}/footage/${plan.footageId}/upload/complete`).expect(200);
  return plan.footageId;
}

export interface FootageBody {
  id: string;
  state: 'uploading' | 'processing' | 'ready' | 'failed';
  failureReason: string | null;
  [field: string]: unknown;
}

/** Polls the footage until it leaves `processing` (the media job runs in the test app's own worker). */
export async function waitUntilProcessed(agent: Agent, workshopId: string, footageId: string, timeoutMs = 30_000): Promise<FootageBody> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const response = await agent.get(`/api/workshops/${workshopId}/footage/${footageId}`).expect(200);
    const footage = response.body as FootageBody;
    if (footage.state === 'ready' || footage.state === 'failed') return footage;
    if (Date.now() > deadline) throw new Error(`footage ${footageId} still ${footage.state} after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
}

/**
 * Polls the footage until its web renditions are made or have failed: until then the media job still writes the
 * footage row, and every such write rightly moves the public guide's tag (tests of 304s wait for this).
 */
export async function waitUntilRenditionsSettled(agent: Agent, workshopId: string, footageId: string, timeoutMs = 120_000): Promise<FootageBody> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const footage = (await agent.get(`/api/workshops/${workshopId}/footage/${footageId}`).expect(200)).body as FootageBody & { renditions: { state: string } };
    if (footage.renditions.state === 'ready' || footage.renditions.state === 'failed') return footage;
    if (Date.now() > deadline) throw new Error(`renditions of ${footageId} still ${footage.renditions.state} after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}
