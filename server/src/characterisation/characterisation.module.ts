import { Injectable, Module, type OnModuleDestroy } from '@nestjs/common';
import { SimulatorPool } from './simulator/simulator-pool.js';

/** The simulation workers of the server: one pool, sized to the machine's cores, stopped with the server. */
@Injectable()
export class SimulationWorkers extends SimulatorPool implements OnModuleDestroy {
  async onModuleDestroy(): Promise<void> {
    await this.destroy();
  }
}

/**
 * Characterising a process's model cards with ngspice into lookup tables (docs/characterisation.md). The pool
 * of simulation workers lives here; the jobs and their API build on it.
 */
@Module({
  providers: [{ provide: SimulationWorkers, useFactory: () => new SimulationWorkers() }],
  exports: [SimulationWorkers],
})
export class CharacterisationModule {}
