import { Global, Module } from '@nestjs/common';
import { FitReportMailPreferences } from '../fit-reports/fit-report-mail.port';
import { FollowsModule } from './follows.module';
import { MailPreferencesService } from './mail-preferences.service';

/**
 * The ports other domains declare and follows fill. Global, so fit reports (which fit news reads) can
 * inject its port without importing follows back.
 */
@Global()
@Module({
  imports: [FollowsModule],
  providers: [
    {
      provide: FitReportMailPreferences,
      // A factory rather than useExisting, so the compiler checks the service answers the port.
      useFactory: (preferences: MailPreferencesService): FitReportMailPreferences => preferences,
      inject: [MailPreferencesService],
    },
  ],
  exports: [FitReportMailPreferences],
})
export class FollowsPortsModule {}
