import { Injectable } from '@nestjs/common';

/** The time digests are scheduled by. Real time, unless a test sets it (digests fall due without waiting a day). */
@Injectable()
export class MailClock {
  private offsetMs = 0;

  now(): Date {
    return new Date(Date.now() + this.offsetMs);
  }

  /** Tests only: from now on the clock reads `instant`, and runs on from there. */
  set(instant: Date): void {
    this.offsetMs = instant.getTime() - Date.now();
  }
}
