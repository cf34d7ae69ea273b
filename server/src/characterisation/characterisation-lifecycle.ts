import { Inject, Injectable, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { CharacterisationRunner } from './jobs/characterisation-runner.js';
import { JOB_QUEUE, type JobQueue } from './jobs/job-queue.js';

/** Starts the job queue with the runner once the server is up, and stops it (leaving running jobs to be resumed) when it goes down. */
@Injectable()
export class CharacterisationLifecycle implements OnApplicationBootstrap, OnModuleDestroy {
  constructor(
    @Inject(JOB_QUEUE) private readonly queue: JobQueue,
    private readonly runner: CharacterisationRunner,
  ) {}

  onApplicationBootstrap(): void {
    this.queue.start((jobId, owner, signal) => this.runner.run(jobId, owner, signal));
  }

  async onModuleDestroy(): Promise<void> {
    await this.queue.stop();
  }
}
