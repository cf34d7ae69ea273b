import { GLOBAL_ROLES, type GlobalRole } from '@channelwright/shared/schemas';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

@Entity('users')
export class UserEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Always stored lower-case, so the unique index makes e-mails unique regardless of case. */
  @Index('IDX_users_email', { unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 100 })
  displayName: string;

  @Column({ type: 'varchar' })
  passwordHash: string;

  @Column({ type: 'simple-enum', enum: GLOBAL_ROLES, default: 'member' })
  role: GlobalRole;

  @Column({ type: 'boolean', default: false })
  disabled: boolean;

  /** Set by an admin: may create, edit and import process profiles. */
  @Column({ type: 'boolean', default: false })
  processMaintainer: boolean;

  /** Set by an admin: reads the whole process library, not only the processes its projects use. */
  @Column({ type: 'boolean', default: false })
  libraryAccess: boolean;

  /** A self-registered account signs in only once it has followed the link mailed to its address. */
  @Column({ type: 'boolean', default: false })
  emailConfirmed: boolean;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  @UpdateDateColumn({ type: COLUMN_TYPES.timestamp })
  updatedAt: Date;
}
