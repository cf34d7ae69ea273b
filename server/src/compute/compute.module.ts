import { Module } from '@nestjs/common';
import { CharacterisationModule } from '../characterisation/characterisation.module.js';
import { ProcessesModule } from '../processes/processes.module.js';
import { ComputeController } from './compute.controller.js';
import { ComputeService } from './compute.service.js';
import { SweepPool } from './sweep-pool.js';

@Module({
  imports: [ProcessesModule, CharacterisationModule],
  controllers: [ComputeController],
  providers: [ComputeService, SweepPool],
  exports: [ComputeService],
})
export class ComputeModule {}
