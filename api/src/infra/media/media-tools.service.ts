import { Injectable, Logger } from '@nestjs/common';
import { execFile, spawn } from 'node:child_process';
import { interpretProbe, isNotMediaMessage, MediaInfo, NotAVideoError } from './media-probe';
import { faststartArguments, PROGRESS_FD, spriteSheetArguments, ProgressReader, type TranscodePlan, type TranscodeProgress, transcodeArguments } from './transcode-command';

/** ffmpeg could not read or decode the source: retrying will not help; `reason` is shown to the creator. */
export class UnreadableSourceError extends Error {
  constructor(readonly reason: string) {
    super(reason);
    this.name = 'UnreadableSourceError';
  }
}

/** A tool run that failed for a reason other than the input (a timeout, storage unreachable); worth retrying. */
export class MediaToolError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'MediaToolError';
  }
}

interface RunResult {
  stdout: Buffer;
  stderr: string;
}

/** Probing and poster frames read at most this much of a file over HTTP; a healthy run takes well under a second. */
const TOOL_TIMEOUT_MS = 120_000;
/** Network reads from storage give up after this long without data (ffmpeg wants microseconds). */
const READ_TIMEOUT_US = String(30_000_000);

/**
 * The only code that runs ffprobe and ffmpeg (Debian's `ffmpeg` package). Inputs are presigned
 * storage URLs (the tools read only the bytes they need, with HTTP Range requests) or local paths.
 */
@Injectable()
export class MediaToolsService {
  private readonly logger = new Logger(MediaToolsService.name);

  /**
   * Duration, size, frame rate and codecs; NotAVideoError when the input is not an accepted video.
   * `extension` is the uploaded file's (WebM and Matroska share a demuxer).
   */
  async probe(input: string, extension?: string): Promise<MediaInfo> {
    const args = ['-v', 'error', ...this.networkOptions(input), '-print_format', 'json', '-show_format', '-show_streams', input];
    let result: RunResult;
    try {
      result = await this.run('ffprobe', args, input);
    } catch (error) {
      if (error instanceof ToolExit && isNotMediaMessage(error.stderr)) {
        throw new NotAVideoError(`The file could not be read as a video (${firstLine(error.stderr)}).`);
      }
      throw this.asToolError('ffprobe', error);
    }
    let parsed: unknown;
    try {
      parsed = JSON.parse(result.stdout.toString('utf8'));
    } catch {
      throw new MediaToolError('ffprobe printed something other than JSON');
    }
    return interpretProbe(parsed, extension);
  }

  /** One frame at `atMs` as a JPEG, 640 pixels wide. */
  async posterFrame(input: string, atMs: number): Promise<Buffer> {
    const args = [
      '-v', 'error',
      ...this.networkOptions(input),
      '-ss', (atMs / 1000).toFixed(3),
      '-i', input,
      '-frames:v', '1',
      '-vf', 'scale=640:-2',
      '-f', 'image2', '-c:v', 'mjpeg', '-q:v', '4',
      'pipe:1',
    ];
    try {
      const { stdout } = await this.run('ffmpeg', args, input);
      if (stdout.length === 0) throw new MediaToolError('ffmpeg produced no poster frame');
      return stdout;
    } catch (error) {
      throw this.asToolError('ffmpeg', error);
    }
  }

  /**
   * Runs the one transcode command (transcode-command.ts) and reports progress blocks as ffmpeg
   * writes them (every half second). Throws UnreadableSourceError when ffmpeg stops on the input.
   */
  async transcode(plan: TranscodePlan, onProgress: (progress: TranscodeProgress) => void): Promise<void> {
    // Generous: far slower than real time means something is stuck.
    const timeoutMs = Math.max(10 * 60_000, plan.durationMs * 20);
    await this.spawnWithProgress(transcodeArguments(plan), plan.input, timeoutMs, onProgress);
  }

  /** Sprite sheets from the thumbnails the transcode wrote. */
  async tileSprites(outputDir: string, sprites: TranscodePlan['sprites']): Promise<void> {
    try {
      await this.run('ffmpeg', spriteSheetArguments(outputDir, sprites), outputDir);
    } catch (error) {
      throw this.asToolError('ffmpeg', error);
    }
  }

  /** The download MP4: the top rendition's segments copied into one file with its index up front. */
  async remuxFaststart(variantPlaylist: string, output: string): Promise<void> {
    try {
      await this.run('ffmpeg', faststartArguments(variantPlaylist, output), variantPlaylist);
    } catch (error) {
      throw this.asToolError('ffmpeg', error);
    }
  }

  private spawnWithProgress(args: string[], input: string, timeoutMs: number, onProgress: (progress: TranscodeProgress) => void): Promise<void> {
    return new Promise((resolve, reject) => {
      const child = spawn('ffmpeg', args, { stdio: ['ignore', 'ignore', 'pipe', 'pipe'], windowsHide: true });
      const reader = new ProgressReader(onProgress);
      let stderr = '';
      let timedOut = false;
      const timer = setTimeout(() => {
        timedOut = true;
        child.kill('SIGKILL');
      }, timeoutMs);
      child.stderr?.setEncoding('utf8');
      child.stderr?.on('data', (chunk: string) => {
        if (stderr.length < 64_000) stderr += chunk;
      });
      const progress = child.stdio[PROGRESS_FD];
      if (progress && 'setEncoding' in progress) {
        progress.setEncoding('utf8');
        progress.on('data', (chunk: string) => reader.push(chunk));
      }
      child.on('error', (error: NodeJS.ErrnoException) => {
        clearTimeout(timer);
        reject(error.code === 'ENOENT' ? new MediaToolError('ffmpeg is not installed (Debian package "ffmpeg")') : error);
      });
      child.on('close', (code, signal) => {
        clearTimeout(timer);
        const cleanStderr = stderr.split(input).join('<input>');
        if (code === 0) return resolve();
        if (timedOut) return reject(new MediaToolError(`ffmpeg took longer than ${Math.round(timeoutMs / 1000)} s`));
        if (signal) return reject(new MediaToolError(`ffmpeg was stopped (${signal})`));
        this.logger.warn(`ffmpeg transcode failed: ${cleanStderr.slice(0, 500)}`);
        if (isNetworkMessage(cleanStderr)) return reject(new MediaToolError(`ffmpeg could not read from storage: ${firstLine(cleanStderr)}`));
        reject(new UnreadableSourceError(`The video could not be converted: ffmpeg stopped reading it (${firstLine(cleanStderr)}).`));
      });
    });
  }

  private networkOptions(input: string): string[] {
    return /^https?:\/\//u.test(input) ? ['-rw_timeout', READ_TIMEOUT_US] : [];
  }

  private run(tool: 'ffprobe' | 'ffmpeg', args: string[], input: string): Promise<RunResult> {
    return new Promise((resolve, reject) => {
      execFile(
        tool,
        args,
        { encoding: 'buffer', timeout: TOOL_TIMEOUT_MS, maxBuffer: 32 * 1024 * 1024, windowsHide: true },
        (error, stdout, stderr) => {
          // Presigned URLs are credentials: never let one reach a message or a log.
          const cleanStderr = stderr.toString('utf8').split(input).join('<input>');
          if (error) {
            const code = (error as NodeJS.ErrnoException).code;
            if (code === 'ENOENT') return reject(new MediaToolError(`${tool} is not installed (Debian package "ffmpeg")`));
            if (error.killed) return reject(new MediaToolError(`${tool} took longer than ${TOOL_TIMEOUT_MS / 1000} s`));
            return reject(new ToolExit(tool, cleanStderr));
          }
          resolve({ stdout, stderr: cleanStderr });
        },
      );
    });
  }

  private asToolError(tool: string, error: unknown): Error {
    if (error instanceof MediaToolError || error instanceof NotAVideoError) return error;
    if (error instanceof ToolExit) {
      this.logger.warn(`${tool} failed: ${error.stderr.slice(0, 500)}`);
      return new MediaToolError(`${tool} failed: ${firstLine(error.stderr)}`);
    }
    return error instanceof Error ? error : new MediaToolError(String(error));
  }
}

class ToolExit extends Error {
  constructor(
    tool: string,
    readonly stderr: string,
  ) {
    super(`${tool} exited with an error`);
  }
}

/** Storage trouble, worth retrying, as opposed to a source ffmpeg cannot decode. */
function isNetworkMessage(stderr: string): boolean {
  return /Connection refused|Connection timed out|Server returned 5\d\d|Server returned 403|I\/O error|Network is unreachable/iu.test(stderr);
}

/** The most telling line of a tool's error output, without the "<input>: " prefix. */
function firstLine(stderr: string): string {
  const lines = stderr
    .split('\n')
    .map((line) => line.replace(/^<input>:\s*/u, '').replace(/^\[[^\]]+\]\s*/u, '').trim())
    .filter((line) => line !== '');
  const telling = lines.find((line) => isNotMediaMessage(line)) ?? lines[lines.length - 1] ?? 'no message';
  return telling.length > 200 ? `${telling.slice(0, 197)}...` : telling;
}
