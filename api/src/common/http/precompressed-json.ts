import { StreamableFile } from '@nestjs/common';
import type { Request, Response } from 'express';
import { gunzipSync } from 'node:zlib';

const JSON_TYPE = 'application/json; charset=utf-8';

/**
 * Sends JSON that is already gzipped as it is (the `compression` middleware leaves an answer with a
 * Content-Encoding alone), or unzipped for the rare client that does not accept gzip.
 */
export function precompressedJson(request: Request, response: Response, gzippedJson: Buffer): StreamableFile {
  response.vary('Accept-Encoding');
  if (request.acceptsEncodings('gzip') === 'gzip') {
    response.setHeader('Content-Encoding', 'gzip');
    return new StreamableFile(gzippedJson, { type: JSON_TYPE, length: gzippedJson.length });
  }
  const json = gunzipSync(gzippedJson);
  return new StreamableFile(json, { type: JSON_TYPE, length: json.length });
}
