import { Injectable, Logger } from '@nestjs/common';
import { AppConfigService } from '../config/app-config.service.js';
import { CharacterisationError } from './simulator/characterisation-error.js';
import { findNativeNgspice } from './simulator/native-ngspice.js';
import type { SimulatorEngine } from './simulator/simulator-pool.js';

/**
 * Which ngspice characterises (CHARACTERISATION_ENGINE): "auto" takes Debian's native ngspice when it is installed and
 * runs (measured 2–4× the points per second of the WebAssembly build on the same grids: docs/characterisation.md,
 * section 6), else the WebAssembly build, which needs no system package; "native" or "wasm" force one.
 */
@Injectable()
export class SimulatorEngineChoice {
  private readonly logger = new Logger('Characterisation');
  private chosen: Promise<SimulatorEngine> | null = null;

  constructor(private readonly config: AppConfigService) {}

  engine(): Promise<SimulatorEngine> {
    this.chosen ??= this.choose();
    return this.chosen;
  }

  private async choose(): Promise<SimulatorEngine> {
    const wanted = this.config.characterisation.engine;
    if (wanted === 'wasm') return 'wasm';
    const native = await findNativeNgspice();
    if (native) {
      this.logger.log(`Characterising with native ngspice ${native.version}`);
      return 'native';
    }
    if (wanted === 'native') {
      this.chosen = null;
      throw new CharacterisationError('SIMULATION_FAILED', 'CHARACTERISATION_ENGINE is native but ngspice is not installed (apt-get install ngspice), or does not run');
    }
    this.logger.log('Native ngspice is not installed: characterising with its WebAssembly build');
    return 'wasm';
  }
}
