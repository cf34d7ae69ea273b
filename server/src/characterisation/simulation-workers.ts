import { Injectable, type OnApplicationShutdown } from '@nestjs/common';
import { SimulatorPool } from './simulator/simulator-pool.js';

/**
 * The simulation workers of the server: one pool (SIMULATION_THREADS, else one per core), stopped last when the
 * server stops (after the job queue has stopped the runs on it, in onModuleDestroy).
 */
@Injectable()
export class SimulationWorkers extends SimulatorPool implements OnApplicationShutdown {
  async onApplicationShutdown(): Promise<void> {
    await this.destroy();
  }
}
