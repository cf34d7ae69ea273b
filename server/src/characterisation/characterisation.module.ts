import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfigService } from '../config/app-config.service.js';
import { DEMO_MODEL_CARDS } from '../processes/processes-demo.seeder.js';
import { ProcessesModule } from '../processes/processes.module.js';
import { DEMO_SEEDERS } from '../seed/demo-seeder.js';
import { UsersModule } from '../users/users.module.js';
import { CharacterisationLifecycle } from './characterisation-lifecycle.js';
import { CharacterisationService } from './characterisation.service.js';
import { CharacterisationsController } from './characterisations.controller.js';
import { DemoCharacterisationSeeder } from './demo/demo-characterisation.seeder.js';
import { DemoModelCardFiles } from './demo/demo-model-cards.js';
import { CharacterisationJobEntity } from './jobs/characterisation-job.entity.js';
import { CharacterisationJobStore } from './jobs/characterisation-job-store.js';
import { CharacterisationRunner } from './jobs/characterisation-runner.js';
import { EmbeddedJobQueue } from './jobs/embedded-job-queue.js';
import { JOB_QUEUE, type JobQueue } from './jobs/job-queue.js';
import { PgBossJobQueue } from './jobs/pg-boss-job-queue.js';
import { ProcessCharacterisationsController } from './process-characterisations.controller.js';
import { SimulationWorkers } from './simulation-workers.js';
import { SimulatorEngineChoice } from './simulator-engine-choice.js';
import { CharacterisationTableChunkEntity } from './tables/characterisation-table-chunk.entity.js';
import { CharacterisationTableEntity } from './tables/characterisation-table.entity.js';
import { CharacterisationTables } from './tables/characterisation-tables.service.js';

/**
 * Characterising a process version's model card with ngspice into lookup tables (docs/characterisation.md): the jobs
 * (stored, queued, run on the simulation workers, resumed after a stop), their tables, the design charts. Exports
 * CharacterisationTables for the table model (compute, sheets) and SimulationWorkers. The job queue under JOB_QUEUE
 * is the embedded one on SQLite and pg-boss's on PostgreSQL (DATABASE_URL: several server processes share the jobs);
 * features that use tables hear of new ones through TABLES_LISTENERS. Gives the library the demo cards (DEMO_MODEL_CARDS) and queues the demo's jobs.
 */
@Module({
  imports: [TypeOrmModule.forFeature([CharacterisationJobEntity, CharacterisationTableEntity, CharacterisationTableChunkEntity]), ProcessesModule, UsersModule],
  controllers: [CharacterisationsController, ProcessCharacterisationsController],
  providers: [
    { provide: SimulationWorkers, inject: [AppConfigService], useFactory: (config: AppConfigService) => new SimulationWorkers({ threads: config.characterisation.threads }) },
    SimulatorEngineChoice,
    CharacterisationJobStore,
    CharacterisationTables,
    CharacterisationRunner,
    CharacterisationService,
    {
      provide: JOB_QUEUE,
      inject: [CharacterisationJobStore, AppConfigService],
      useFactory: (store: CharacterisationJobStore, config: AppConfigService): JobQueue =>
        config.usesPostgres ? new PgBossJobQueue(store, config) : new EmbeddedJobQueue(store, config),
    },
    CharacterisationLifecycle,
    { provide: DEMO_MODEL_CARDS, useClass: DemoModelCardFiles },
    { provide: DEMO_SEEDERS, useClass: DemoCharacterisationSeeder },
  ],
  exports: [SimulationWorkers, CharacterisationTables],
})
export class CharacterisationModule {}
