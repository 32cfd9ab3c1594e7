#!/usr/bin/env node
// Local S3 stand-in for development and tests. Real S3 replaces it by configuration alone.
'use strict';
const S3rver = require('s3rver');
const { mkdirSync } = require('node:fs');

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
