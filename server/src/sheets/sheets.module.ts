import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { CharacterisationModule } from '../characterisation/characterisation.module.js';
import { TABLES_LISTENERS } from '../characterisation/tables/tables-listener.js';
import { ProcessesModule } from '../processes/processes.module.js';
import { PROCESS_USE_SOURCES } from '../processes/process-visibility.js';
import { PROJECT_RESOURCE_RESOLVERS } from '../projects/project-resource-resolver.js';
import { PROJECT_SHEET_COUNTS } from '../projects/project-sheet-counts.js';
import { ProjectsModule } from '../projects/projects.module.js';
import { DEMO_SEEDERS } from '../seed/demo-seeder.js';
import { AnalysisPool } from './analyses/analysis-pool.js';
import { CornerMatrixService } from './analyses/corner-matrix.service.js';
import { MatchGroupsService } from './analyses/match-groups.service.js';
import { SheetLeakageService } from './analyses/sheet-leakage.service.js';
import { DeviceEntity } from './device.entity.js';
import { DevicesController } from './devices.controller.js';
import { DevicesService } from './devices.service.js';
import { ProjectSheetsController } from './project-sheets.controller.js';
import { SheetProjectResolver } from './sheet-project.resolver.js';
import { SheetReader } from './sheet-reader.js';
import { SheetTables } from './sheet-tables.js';
import { SheetTablesListener } from './sheet-tables-listener.js';
import { SheetUsage } from './sheet-usage.js';
import { SheetEntity } from './sheet.entity.js';
import { SheetsController } from './sheets.controller.js';
import { SheetsDemoSeeder } from './sheets-demo.seeder.js';
import { SheetsService } from './sheets.service.js';
import { SheetExportService } from './exchange/sheet-export.service.js';
import { SheetImportService } from './exchange/sheet-import.service.js';
import { SheetMigrationService } from './migration/sheet-migration.service.js';
import { SheetAnalysesController } from './sheet-analyses.controller.js';
import { SheetFilesController } from './sheet-files.controller.js';

/**
 * Sizing sheets and their devices, with results computed by the engine and stored. Exports SheetReader
 * (a sheet with its process version and devices, e.g. for freezing a revision) and SheetsService. Tells
 * projects their sheet counts and the library who uses which process (SheetUsage); lets the features
 * above it refuse a sheet's deletion (SHEET_REMOVAL_CHECKS) and name its newest revision in exports
 * (SHEET_REVISION_FACTS). The whole-sheet analyses (corner matrix, leakage budget, match groups) run large
 * jobs in a pool of worker threads (AnalysisPool). Sizes table-model devices from the characterisation
 * module's tables and computes the devices waiting for a table when it hears of new ones (TABLES_LISTENERS).
 */
@Module({
  imports: [TypeOrmModule.forFeature([SheetEntity, DeviceEntity]), ProcessesModule, ProjectsModule, AuditModule, CharacterisationModule],
  controllers: [ProjectSheetsController, SheetsController, DevicesController, SheetAnalysesController, SheetFilesController],
  providers: [
    SheetsService,
    DevicesService,
    SheetReader,
    SheetUsage,
    AnalysisPool,
    CornerMatrixService,
    SheetLeakageService,
    MatchGroupsService,
    SheetExportService,
    SheetImportService,
    SheetMigrationService,
    SheetTables,
    { provide: TABLES_LISTENERS, useClass: SheetTablesListener },
    { provide: PROJECT_RESOURCE_RESOLVERS, useClass: SheetProjectResolver },
    { provide: PROJECT_SHEET_COUNTS, useExisting: SheetUsage },
    { provide: PROCESS_USE_SOURCES, useExisting: SheetUsage },
    { provide: DEMO_SEEDERS, useClass: SheetsDemoSeeder },
  ],
  exports: [SheetsService, SheetReader],
})
export class SheetsModule {}
