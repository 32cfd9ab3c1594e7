import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, Repository } from 'typeorm';
import { normalizeEmail } from './email-address';
import { User } from './entities/user.entity';
import type { UpdateProfileDto } from './dto/update-profile.dto';

export interface NewUser {
  email: string;
  passwordHash: string;
  displayName: string;
}

@Injectable()
export class UsersService {
  constructor(@InjectRepository(User) private readonly users: Repository<User>) {}

  findById(id: string): Promise<User | null> {
    return this.users.findOneBy({ id });
  }

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOneBy({ email: normalizeEmail(email) });
  }

  /** Display names by user id, for lists that say who did what; ids of deleted users are simply absent. */
  async displayNames(ids: readonly string[]): Promise<Map<string, string>> {
    const unique = [...new Set(ids)];
    if (unique.length === 0) return new Map();
    const users = await this.users.find({ where: { id: In(unique) }, select: { id: true, displayName: true } });
    return new Map(users.map((user) => [user.id, user.displayName]));
  }

  async getById(id: string): Promise<User> {
    const user = await this.findById(id);
    if (!user) throw new NotFoundException('User not found');
    return user;
  }

  create(data: NewUser): Promise<User> {
    const user = this.users.create({
      email: normalizeEmail(data.email),
      passwordHash: data.passwordHash,
      displayName: data.displayName,
      preferredUnits: 'metric',
      emailVerifiedAt: null,
      isAdmin: false,
      disabledAt: null,
    });
    return this.users.save(user);
  }

  async updateProfile(id: string, changes: UpdateProfileDto): Promise<User> {
    const user = await this.getById(id);
    if (changes.displayName !== undefined) user.displayName = changes.displayName;
    if (changes.preferredUnits !== undefined) user.preferredUnits = changes.preferredUnits;
    return this.users.save(user);
  }

  save(user: User): Promise<User> {
    return this.users.save(user);
  }
}
