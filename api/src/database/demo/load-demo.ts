import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { DataSource } from 'typeorm';
import { AppModule } from '../../app.module';
import { demoSignInLines, loadDemoAccounts } from './demo-accounts';
import { loadDemoFitData } from './demo-fit-data';
import { loadDemoFootage } from './demo-footage';
import { loadDemoFollower, loadDemoGuide } from './demo-guide';
import { loadDemoMarks } from './demo-marks';
import { loadDemoFinderEvidence, loadDemoSecondWorkshop, SECOND_WORKSHOP_OWNER } from './demo-second-workshop';

/**
 * Loads the invented demo scenario (DESIGN.md) into the database; idempotent. Run by `npm start`
 * after the migrations, or by hand with `npm run demo:load -w api` after a build.
 * Each part builds on the ids of the one before: accounts and the workshop first, then the fit data.
 */
async function loadDemo(): Promise<void> {
  const app = await NestFactory.createApplicationContext(AppModule, { logger: ['error', 'warn'] });
  try {
    const accounts = await loadDemoAccounts(app.get(DataSource));
    await loadDemoFitData(app, { workshopId: accounts.workshopId, creatorId: accounts.ownerId });
    // The build's footage: generated, uploaded and processed like a creator's, then transcribed.
    console.log(`[demo] ${await loadDemoFootage(app, { workshopId: accounts.workshopId, creatorId: accounts.ownerId })}`);
    // Its marks, at the moments the narration names things, and the transcript's suggested marks.
    console.log(`[demo] ${await loadDemoMarks(app, { workshopId: accounts.workshopId, creatorId: accounts.ownerId })}`);
    // The build's published guide, with step marks; after the marks, so it can point at them.
    console.log(`[demo] ${await loadDemoGuide(app, { workshopId: accounts.workshopId, creatorId: accounts.ownerId })}`);
    console.log(`[demo] ${await loadDemoFollower(app, { workshopId: accounts.workshopId, followerId: accounts.followerId })}`);
    // The fit finder's demo: the spline check confirmed at its moment, and a second workshop whose coupler is a near miss.
    console.log(`[demo] ${await loadDemoFinderEvidence(app, { workshopId: accounts.workshopId, creatorId: accounts.ownerId })}`);
    console.log(`[demo] ${await loadDemoSecondWorkshop(app)}`);
    // Printed plainly (the app's logger is quietened to warnings while the demo loads).
    console.log(`[demo] workshop "Harrow Lane Garage" is ready: ${accounts.workshopId}`);
    for (const line of demoSignInLines()) console.log(`[demo] ${line}`);
    console.log(`[demo]   ${SECOND_WORKSHOP_OWNER.email.padEnd(30)} ${SECOND_WORKSHOP_OWNER.displayName}, ${SECOND_WORKSHOP_OWNER.role}`);
  } finally {
    await app.close();
  }
}

loadDemo().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exit(1);
});
