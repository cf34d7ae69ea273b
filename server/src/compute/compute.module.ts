import { Module } from '@nestjs/common';
import { ProcessesModule } from '../processes/processes.module.js';
import { ComputeController } from './compute.controller.js';
import { ComputeService } from './compute.service.js';

@Module({
  imports: [ProcessesModule],
  controllers: [ComputeController],
  providers: [ComputeService],
  exports: [ComputeService],
})
export class ComputeModule {}
