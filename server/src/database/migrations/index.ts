import type { MigrationInterface } from 'typeorm';
import { CreateUsers1796164741627 } from './1796164741627-create-users.js';
import { CreateProcessProfiles1796250000000 } from './1796250000000-create-process-profiles.js';
import { CreateMail1796400000000 } from './1796400000000-create-mail.js';
import { CreateAuditEvents1796400000001 } from './1796400000001-create-audit-events.js';
import { CreateProjectsAndSheets1796450000000 } from './1796450000000-create-projects-and-sheets.js';
import { CreateRevisions1796500000000 } from './1796500000000-create-revisions.js';
import { CreateReviews1796500000001 } from './1796500000001-create-reviews.js';
import { AccountAccess1796600000000 } from './1796600000000-account-access.js';
import { ProcessModelCards1796700000000 } from './1796700000000-process-model-cards.js';
import { SheetsTableModel1796700000001 } from './1796700000001-sheets-table-model.js';
import { CreateCharacterisations1796700000002 } from './1796700000002-create-characterisations.js';
import { SheetBudgets1796700000003 } from './1796700000003-sheet-budgets.js';
import { ParameterConvention1796800000000 } from './1796800000000-parameter-convention.js';
import { CreateExtractions1796800000001 } from './1796800000001-create-extractions.js';

type MigrationClass = new () => MigrationInterface;

/** Every migration, oldest first. A feature appends its own; never edit one that has shipped. */
export const MIGRATIONS: MigrationClass[] = [CreateUsers1796164741627, CreateProcessProfiles1796250000000, CreateMail1796400000000, CreateAuditEvents1796400000001, CreateProjectsAndSheets1796450000000, CreateRevisions1796500000000, CreateReviews1796500000001, AccountAccess1796600000000, ProcessModelCards1796700000000, SheetsTableModel1796700000001, CreateCharacterisations1796700000002, SheetBudgets1796700000003, ParameterConvention1796800000000, CreateExtractions1796800000001];
