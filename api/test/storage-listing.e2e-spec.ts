import { NestExpressApplication } from '@nestjs/platform-express';
import { randomBytes } from 'node:crypto';
import { StorageService } from '../src/infra/storage/storage.service';
import { createTestApp } from './create-test-app';

jest.setTimeout(120_000);

/**
 * A long footage stores thousands of segments under one folder, and a listing pages at 1,000 keys: the
 * second page needs the store's continuation token. (The S3 fake once failed every such listing with
 * InternalError: its token cipher, DES, is gone from OpenSSL 3; local-services/s3/server.js.)
 */
describe('storage lists and clears folders past one page (real S3 fake)', () => {
  let app: NestExpressApplication;
  let storage: StorageService;
  const folder = `listing-test/${randomBytes(4).toString('hex')}/`;
  const names = Array.from({ length: 1_205 }, (_, index) => `${folder}seg-${String(index).padStart(5, '0')}.m4s`);

  beforeAll(async () => {
    app = await createTestApp();
    storage = app.get(StorageService);
  });
  afterAll(async () => {
    await storage.deletePrefix(folder).catch(() => undefined);
    await app.close();
  });

  it('lists every key over two pages, then deletes every one', async () => {
    for (let start = 0; start < names.length; start += 50) {
      await Promise.all(names.slice(start, start + 50).map((name) => storage.putObject(name, Buffer.from('x'), 'video/iso.segment')));
    }
    expect((await storage.listKeys(folder)).sort()).toEqual(names);
    expect(await storage.deletePrefix(folder)).toBe(names.length);
    expect(await storage.listKeys(folder)).toEqual([]);
  });
});
