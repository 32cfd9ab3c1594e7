import { MiddlewareConsumer, Module, NestModule } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { EventEmitterModule } from '@nestjs/event-emitter';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfig, loadAppConfig } from './config/app-config';
import { RequestLoggerMiddleware } from './common/request-logger.middleware';
import { typeormOptions } from './database/typeorm-options';
import { HealthModule } from './health/health.module';
import { InfraModule } from './infra/infra.module';
import { OutboxModule } from './outbox/outbox.module';
import { AdminModule } from './admin/admin.module';
import { AuthModule } from './auth/auth.module';
import { UsersModule } from './users/users.module';
import { WorkshopsModule } from './workshops/workshops.module';
import { AssembliesModule } from './assemblies/assemblies.module';
import { BuildsModule } from './builds/builds.module';
import { DeletionImpactModule } from './deletion-impact/deletion-impact.module';
import { FitChecksModule } from './fit-checks/fit-checks.module';
import { FitReportsModule } from './fit-reports/fit-reports.module';
import { FitFinderModule } from './fit-finder/fit-finder.module';
import { FollowsModule } from './follows/follows.module';
import { FollowsPortsModule } from './follows/follows-ports.module';
import { FootageModule } from './footage/footage.module';
import { GuideRevisionsModule } from './guide-revisions/guide-revisions.module';
import { GuidesModule } from './guides/guides.module';
import { GuidesPortsModule } from './guides/guides-ports.module';
import { MarksModule } from './marks/marks.module';
import { MarksPortsModule } from './marks/marks-ports.module';
import { MeasurementsModule } from './measurements/measurements.module';
import { PartsModule } from './parts/parts.module';
import { SearchModule } from './search/search.module';
import { ToolsModule } from './tools/tools.module';
import { TranscriptsModule } from './transcripts/transcripts.module';
import { TranscriptsPortsModule } from './transcripts/transcripts-ports.module';

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, load: [() => loadAppConfig()] }),
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppConfig, true>) => ({
        ...typeormOptions(config.get('database', { infer: true })),
        entities: undefined,
        autoLoadEntities: true,
      }),
    }),
    EventEmitterModule.forRoot(),
    InfraModule,
    OutboxModule,
    HealthModule,
    AuthModule,
    UsersModule,
    WorkshopsModule,
    AdminModule,
    ToolsModule,
    BuildsModule,
    DeletionImpactModule,
    PartsModule,
    MeasurementsModule,
    FitChecksModule,
    AssembliesModule,
    FootageModule,
    TranscriptsModule,
    MarksModule,
    GuidesModule,
    GuideRevisionsModule,
    FollowsModule,
    FitReportsModule,
    FitFinderModule,
    SearchModule,
    // What a domain asks of one that depends on it goes through a port it declares and the other fills (global modules).
    MarksPortsModule,
    GuidesPortsModule,
    TranscriptsPortsModule,
    FollowsPortsModule,
  ],
})
export class AppModule implements NestModule {
  configure(consumer: MiddlewareConsumer): void {
    consumer.apply(RequestLoggerMiddleware).forRoutes('*path');
  }
}
