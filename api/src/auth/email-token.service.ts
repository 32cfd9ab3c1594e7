import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { IsNull, MoreThan, Repository } from 'typeorm';
import { hashSecretToken, newSecretToken } from '../common/secret-token';
import { EMAIL_TOKEN_TTL_MS } from './auth.constants';
import { EmailToken, type EmailTokenPurpose } from './entities/email-token.entity';

/** Single-use, expiring tokens for e-mailed links (verify, reset password, change e-mail). */
@Injectable()
export class EmailTokenService {
  constructor(@InjectRepository(EmailToken) private readonly tokens: Repository<EmailToken>) {}

  /** Makes a new token; any earlier unused token of the same purpose for the user stops working. */
  async issue(userId: string, purpose: EmailTokenPurpose, newEmail: string | null = null): Promise<string> {
    await this.tokens.delete({ userId, purpose, usedAt: IsNull() });
    const token = newSecretToken();
    await this.tokens.insert(
      this.tokens.create({
        userId,
        purpose,
        newEmail,
        tokenHash: hashSecretToken(token),
        expiresAt: new Date(Date.now() + EMAIL_TOKEN_TTL_MS[purpose]),
        usedAt: null,
      }),
    );
    return token;
  }

  /**
   * Uses a token up and returns it, or null when it is unknown, used, expired or for another purpose.
   * The conditional UPDATE makes two simultaneous uses impossible: only one of them changes the row.
   */
  async consume(token: string, purpose: EmailTokenPurpose): Promise<EmailToken | null> {
    const tokenHash = hashSecretToken(token);
    const result = await this.tokens.update(
      { tokenHash, purpose, usedAt: IsNull(), expiresAt: MoreThan(new Date()) },
      { usedAt: new Date() },
    );
    if (result.affected !== 1) return null;
    return this.tokens.findOneBy({ tokenHash });
  }
}
