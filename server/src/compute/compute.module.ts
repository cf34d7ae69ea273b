import { Module } from '@nestjs/common';
import { CharacterisationModule } from '../characterisation/characterisation.module.js';
import { ProcessesModule } from '../processes/processes.module.js';
import { ComputeController } from './compute.controller.js';
import { ComputeService } from './compute.service.js';

@Module({
  imports: [ProcessesModule, CharacterisationModule],
  controllers: [ComputeController],
  providers: [ComputeService],
  exports: [ComputeService],
})
export class ComputeModule {}
