#!/usr/bin/env node
// Local S3 stand-in for development and tests. Real S3 replaces it by configuration alone.
'use strict';
const crypto = require('node:crypto');

// s3rver encrypts list continuation tokens with DES, which OpenSSL 3 no longer offers: every listing of more
// than 1,000 objects (a long footage's segments, a backup of the bucket) failed with InternalError. The token
// is opaque to clients, so AES-128 with the same key and IV (each doubled to 16 bytes) stands in both ways.
for (const name of ['createCipheriv', 'createDecipheriv']) {
  const original = crypto[name];
  crypto[name] = (algorithm, key, iv, options) =>
    algorithm === 'des'
      ? original('aes-128-cbc', Buffer.concat([key, key]), Buffer.concat([iv, iv]), options)
      : original(algorithm, key, iv, options);
}

const S3rver = require('s3rver');
const S3Error = require('s3rver/lib/models/error');
const { mkdirSync } = require('node:fs');
const { readFile } = require('node:fs/promises');
const path = require('node:path');

const port = Number(process.env.S3_FAKE_PORT || 4569);
const directory = process.env.S3_FAKE_DIR || '.data/s3';
const bucket = process.env.S3_BUCKET || 'fitwright-media';
const origins = (process.env.S3_CORS_ORIGINS || 'http://localhost:3000').split(',');

// Browsers upload parts and play video straight from storage, so the bucket answers their origins.
const corsXml = `<CORSConfiguration>
  <CORSRule>
    ${origins.map((origin) => `<AllowedOrigin>${origin}</AllowedOrigin>`).join('\n    ')}
    <AllowedMethod>GET</AllowedMethod>
    <AllowedMethod>HEAD</AllowedMethod>
    <AllowedMethod>PUT</AllowedMethod>
    <AllowedMethod>POST</AllowedMethod>
    <AllowedHeader>*</AllowedHeader>
    <ExposeHeader>ETag</ExposeHeader>
    <MaxAgeSeconds>3000</MaxAgeSeconds>
  </CORSRule>
</CORSConfiguration>`;

mkdirSync(directory, { recursive: true });
const server = new S3rver({
  port,
  address: '127.0.0.1',
  directory,
  silent: true,
  configureBuckets: [{ name: bucket, configs: [corsXml] }],
});

/**
 * s3rver assembles a multipart upload without comparing the listed parts with what it holds: a
 * part that was never uploaded makes a file stream fail outside any request and the process dies
 * (an ETag that does not match is silently accepted). Check every part first and answer as S3
 * does: NoSuchUpload (404), InvalidPartOrder or InvalidPart (400) naming the part.
 */
const assembleParts = server.store.putObjectMultipart.bind(server.store);
server.store.putObjectMultipart = async (bucketName, uploadId, parts) => {
  const uploadDirectory = path.join(server.store.getResourcePath(bucketName, undefined, 'uploads'), String(uploadId));
  if (!/^[0-9a-f]+$/.test(String(uploadId)) || !(await readable(path.join(uploadDirectory, 'key')))) {
    throw new S3Error(
      'NoSuchUpload',
      'The specified upload does not exist. The upload ID may be invalid, or the upload may have been aborted or completed.',
      { UploadId: uploadId },
    );
  }
  for (let index = 0; index < parts.length; index += 1) {
    const { number, etag } = parts[index];
    if (!Number.isInteger(number) || number < 1 || number > 10000 || (index > 0 && number <= parts[index - 1].number)) {
      throw new S3Error('InvalidPartOrder', 'The list of parts was not in ascending order. Parts must be ordered by part number.', {
        UploadId: uploadId,
        PartNumber: parts[index].number,
      });
    }
    const storedMd5 = await readable(path.join(uploadDirectory, `${number}.md5`));
    if (storedMd5 === null || storedMd5.trim() !== String(etag).toLowerCase()) {
      throw new S3Error(
        'InvalidPart',
        "One or more of the specified parts could not be found. The part may not have been uploaded, or the specified entity tag may not match the part's entity tag.",
        { UploadId: uploadId, PartNumber: number, ETag: etag },
      );
    }
  }
  return assembleParts(bucketName, uploadId, parts);
};

/**
 * S3_FAKE_PUT_DELAY_MS (default 0) makes every whole-object PUT answer that much later: a slow store,
 * so a fault test can catch a writer half-way through storing many objects.
 */
const putDelayMs = Number(process.env.S3_FAKE_PUT_DELAY_MS || 0);
if (putDelayMs > 0) {
  const storeObject = server.store.putObject.bind(server.store);
  server.store.putObject = async (object) => {
    await new Promise((resolve) => setTimeout(resolve, putDelayMs));
    return storeObject(object);
  };
}

/** A file's text, or null when it is not there. */
async function readable(file) {
  try {
    return await readFile(file, 'utf8');
  } catch (error) {
    if (error && error.code === 'ENOENT') return null;
    throw error;
  }
}

// Last resort: a request that still trips s3rver must cost that request, not every other one.
process.on('uncaughtException', (error) => console.error(`S3 fake kept serving after an unhandled error: ${error.stack || error}`));
process.on('unhandledRejection', (reason) => console.error(`S3 fake kept serving after an unhandled rejection: ${reason}`));

server.run().then(
  () => console.log(`S3 fake on http://127.0.0.1:${port}, bucket "${bucket}", data in ${directory}`),
  (error) => {
    console.error(`S3 fake failed to start: ${error.message}`);
    process.exit(1);
  },
);

const stop = () => server.close().finally(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
