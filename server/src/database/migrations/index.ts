import type { MigrationInterface } from 'typeorm';
import { CreateUsers1796164741627 } from './1796164741627-create-users.js';

type MigrationClass = new () => MigrationInterface;

/** Every migration, oldest first. A feature appends its own; never edit one that has shipped. */
export const MIGRATIONS: MigrationClass[] = [CreateUsers1796164741627];
