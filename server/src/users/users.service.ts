import type { UpdateUserRequest, UserRef } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, type EntityManager, type Repository } from 'typeorm';
import { conflict, notFound } from '../common/errors/domain-error.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { UserEntity } from './user.entity.js';

export interface NewAccount {
  email: string;
  displayName: string;
  passwordHash: string;
  /** False (the default) for a self-registered account until it follows the link mailed to it. */
  emailConfirmed?: boolean;
}

/** An account as UsersService hands it out (and the JWT guard puts on the request): other modules use this type, never the entity. */
export type Account = UserEntity;

/** A user as other modules show one: name and address, never the hash. */
export interface UserCard extends UserRef {
  email: string;
}

/**
 * How long the account behind a token is reused without reading it again. Every change made through this
 * service forgets it at once; the bound matters only for a change made by another server process on a
 * shared database (a disabled account is refused there within this time).
 */
export const ACCOUNT_CACHE_MS = 2000;
const ACCOUNT_CACHE_LIMIT = 10_000;

/** The accounts. Other modules read users only through this service (cards by id, lookup by e-mail). */
@Injectable()
export class UsersService {
  /** Accounts read for authenticated requests, with the time they were read (see ACCOUNT_CACHE_MS). */
  private readonly recent = new Map<string, { account: UserEntity; readAt: number }>();

  constructor(
    @InjectRepository(UserEntity) private readonly users: Repository<UserEntity>,
    private readonly unitOfWork: UnitOfWork,
  ) {}

  findById(id: string, manager?: EntityManager): Promise<UserEntity | null> {
    return this.repository(manager).findOneBy({ id });
  }

  /**
   * The account of an authenticated request: read at most once per ACCOUNT_CACHE_MS per account, so a burst
   * of requests does not read the same row each time (a copy is handed out: callers cannot change the cache).
   */
  async accountOfRequest(id: string): Promise<UserEntity | null> {
    const now = Date.now();
    const cached = this.recent.get(id);
    if (cached && now - cached.readAt < ACCOUNT_CACHE_MS) return this.users.create({ ...cached.account });
    const account = await this.users.findOneBy({ id });
    if (!account) {
      this.recent.delete(id);
      return null;
    }
    if (this.recent.size >= ACCOUNT_CACHE_LIMIT) this.recent.clear();
    this.recent.set(id, { account: this.users.create({ ...account }), readAt: now });
    return account;
  }

  /** Forgets the cached account after a change (called by every write below, whether its transaction commits or not). */
  private forget(id: string): void {
    this.recent.delete(id);
  }

  findByEmail(email: string, manager?: EntityManager): Promise<UserEntity | null> {
    return this.repository(manager).findOneBy({ email: email.trim().toLowerCase() });
  }

  /** Name and address of each id that is an account (missing ids are left out). */
  async cards(ids: Iterable<string | null | undefined>, manager?: EntityManager): Promise<Map<string, UserCard>> {
    const wanted = [...new Set([...ids].filter((id): id is string => typeof id === 'string'))];
    if (wanted.length === 0) return new Map();
    const rows = await this.repository(manager).find({ select: { id: true, displayName: true, email: true }, where: { id: In(wanted) } });
    return new Map(rows.map((row) => [row.id, { id: row.id, displayName: row.displayName, email: row.email }]));
  }

  list(): Promise<UserEntity[]> {
    return this.users.find({ order: { email: 'ASC' } });
  }

  async hasAnyAccount(manager?: EntityManager): Promise<boolean> {
    return (await this.repository(manager).count()) > 0;
  }

  /** Creates an account; the first account ever created becomes admin. 409 EMAIL_TAKEN when the address has one. */
  createAccount(account: NewAccount, manager?: EntityManager): Promise<UserEntity> {
    const create = async (m: EntityManager) => {
      const repository = m.getRepository(UserEntity);
      const email = account.email.trim().toLowerCase();
      if (await repository.existsBy({ email })) {
        throw conflict('EMAIL_TAKEN', 'An account with this e-mail already exists', 'email');
      }
      const isFirst = (await repository.count()) === 0;
      return repository.save(repository.create({ ...account, email, role: isFirst ? 'admin' : 'member' }));
    };
    return manager ? create(manager) : this.unitOfWork.run(create);
  }

  /** Stores a new hash (a re-registration of an unconfirmed account, or a re-hash on sign-in). */
  async setPassword(id: string, passwordHash: string, change: Partial<Pick<UserEntity, 'displayName'>> = {}, manager?: EntityManager): Promise<void> {
    this.forget(id);
    await this.repository(manager).update({ id }, { passwordHash, ...change });
  }

  /** Sets roles and grants directly, without the last-admin check (the demo seed, on an empty database). */
  async grant(id: string, grants: Partial<Pick<UserEntity, 'role' | 'processMaintainer' | 'libraryAccess'>>, manager?: EntityManager): Promise<void> {
    this.forget(id);
    await this.repository(manager).update({ id }, grants);
  }

  async confirmEmail(id: string, manager?: EntityManager): Promise<void> {
    this.forget(id);
    await this.repository(manager).update({ id }, { emailConfirmed: true });
  }

  /** Changes role, disabled, processMaintainer or libraryAccess; refuses a change that would leave no enabled admin. */
  async update(id: string, change: UpdateUserRequest): Promise<UserEntity> {
    this.forget(id);
    const saved = await this.unitOfWork.run(async (manager) => {
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
    this.forget(id); // a request read while the change was being written must not keep the old row
    return saved;
  }

  private repository(manager: EntityManager | undefined): Repository<UserEntity> {
    return manager ? manager.getRepository(UserEntity) : this.users;
  }
}

function isActiveAdmin(user: UserEntity): boolean {
  return user.role === 'admin' && !user.disabled;
}

function countActiveAdmins(manager: EntityManager): Promise<number> {
  return manager.getRepository(UserEntity).countBy({ role: 'admin', disabled: false });
}
