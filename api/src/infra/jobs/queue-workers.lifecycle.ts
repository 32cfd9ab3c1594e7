import { getQueueToken } from '@nestjs/bull';
import { Injectable, OnApplicationBootstrap } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import type { Queue } from 'bull';
import { setTimeout as sleep } from 'node:timers/promises';
import { QUEUES } from './queues';

/** How long start-up waits for a queue's worker loop before giving up on waiting (the loop keeps trying). */
const WORKER_START_LIMIT_MS = 15_000;

/**
 * Holds application start-up until every queue's worker loop is running.
 *
 * Bull starts a worker in steps (connect, requeue stalled jobs, open the blocking connection) from a
 * promise nobody awaits; closing the queue in between rejects that promise unhandled ("Connection is
 * closed"). Waiting here means an app that finished `init()` can always be closed cleanly, and a
 * Redis that cannot be reached shows up at start-up rather than at the first job.
 */
@Injectable()
export class QueueWorkersLifecycle implements OnApplicationBootstrap {
  constructor(private readonly moduleRef: ModuleRef) {}

  async onApplicationBootstrap(): Promise<void> {
    await Promise.all(Object.values(QUEUES).map((name) => this.waitForWorker(this.moduleRef.get<Queue>(getQueueToken(name), { strict: false }))));
  }

  private async waitForWorker(queue: Queue): Promise<void> {
    await queue.isReady();
    // Bull has no public "running" signal; it sets this timer as the last step before it takes jobs.
    const internals = queue as unknown as { handlers: object; moveUnlockedJobsToWaitInterval?: unknown; closing?: unknown };
    if (Object.keys(internals.handlers).length === 0) return;
    const deadline = Date.now() + WORKER_START_LIMIT_MS;
    while (!internals.moveUnlockedJobsToWaitInterval && !internals.closing && Date.now() < deadline) {
      await sleep(10);
    }
  }
}
