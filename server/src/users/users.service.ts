import type { UpdateUserRequest } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import type { DataSource, EntityManager, Repository } from 'typeorm';
import { conflict, notFound } from '../common/errors/domain-error.js';
import { runInTransaction } from '../database/run-in-transaction.js';
import { UserEntity } from './user.entity.js';

export interface NewAccount {
  email: string;
  displayName: string;
  passwordHash: string;
}

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(UserEntity) private readonly users: Repository<UserEntity>,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  findById(id: string): Promise<UserEntity | null> {
    return this.users.findOneBy({ id });
  }

  findByEmail(email: string): Promise<UserEntity | null> {
    return this.users.findOneBy({ email: email.trim().toLowerCase() });
  }

  list(): Promise<UserEntity[]> {
    return this.users.find({ order: { email: 'ASC' } });
  }

  async hasAnyAccount(): Promise<boolean> {
    return (await this.users.count()) > 0;
  }

  /** Creates an account; the first account ever created becomes admin. */
  createAccount(account: NewAccount): Promise<UserEntity> {
    return runInTransaction(this.dataSource, async (manager) => {
      const repository = manager.getRepository(UserEntity);
      const email = account.email.trim().toLowerCase();
      if (await repository.existsBy({ email })) {
        throw conflict('EMAIL_TAKEN', 'An account with this e-mail already exists', 'email');
      }
      const isFirst = (await repository.count()) === 0;
      return repository.save(repository.create({ ...account, email, role: isFirst ? 'admin' : 'member' }));
    });
  }

  /** Changes role, disabled or processMaintainer; refuses a change that would leave no enabled admin. */
  update(id: string, change: UpdateUserRequest): Promise<UserEntity> {
    return runInTransaction(this.dataSource, async (manager) => {
      const repository = manager.getRepository(UserEntity);
      const user = await repository.findOneBy({ id });
      if (!user) throw notFound('USER_NOT_FOUND', 'There is no user with this id');
      const updated = repository.merge(repository.create({ ...user }), change);
      if (isActiveAdmin(user) && !isActiveAdmin(updated) && (await countActiveAdmins(manager)) === 1) {
        throw conflict(
          'LAST_ADMIN',
          'This is the last enabled admin: make another user admin before disabling or demoting this one',
          change.role !== undefined && change.role !== 'admin' ? 'role' : 'disabled',
        );
      }
      return repository.save(updated);
    });
  }
}

function isActiveAdmin(user: UserEntity): boolean {
  return user.role === 'admin' && !user.disabled;
}

function countActiveAdmins(manager: EntityManager): Promise<number> {
  return manager.getRepository(UserEntity).countBy({ role: 'admin', disabled: false });
}
