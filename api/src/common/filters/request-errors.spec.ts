import { bodyParserErrorBody, databaseErrorBody, JSON_TOO_DEEP } from './request-errors';

/** Shapes of the errors as mysql2 (MariaDB 10.11) and body-parser 2 raise them; messages copied from real refusals. */
describe('errors raised outside Nest, shaped as 4xx', () => {
  it('names the column of a foreign key that points nowhere, as a camel-case field (422)', () => {
    const refused = {
      code: 'ER_NO_REFERENCED_ROW_2',
      sqlMessage:
        'Cannot add or update a child row: a foreign key constraint fails (`fitwright_test`.`measurements`, CONSTRAINT `fk_measurements_footage` FOREIGN KEY (`footage_id`) REFERENCES `footage` (`id`) ON DELETE SET NULL)',
    };
    expect(databaseErrorBody(refused)).toEqual({
      statusCode: 422,
      message: 'footageId names nothing in this workshop',
      errors: { footageId: 'footageId names nothing in this workshop' },
      code: 'reference_not_found',
    });
  });

  it('names the column of a value out of range or too long (400)', () => {
    expect(databaseErrorBody({ code: 'ER_WARN_DATA_OUT_OF_RANGE', sqlMessage: "Out of range value for column 'start_ms' at row 1" })).toMatchObject({
      statusCode: 400,
      errors: { startMs: 'startMs is out of range' },
    });
    expect(databaseErrorBody({ code: 'ER_DATA_TOO_LONG', sqlMessage: "Data too long for column 'title' at row 1" })).toMatchObject({
      statusCode: 400,
      errors: { title: 'title is too long' },
    });
  });

  it('leaves other errors to the 500 path', () => {
    expect(databaseErrorBody(new Error('connect ECONNREFUSED'))).toBeUndefined();
    expect(databaseErrorBody({ code: 'ER_LOCK_DEADLOCK' })).toBeUndefined();
    expect(databaseErrorBody(null)).toBeUndefined();
  });

  it('answers body-parser refusals with their own status and a sentence a person can act on', () => {
    expect(bodyParserErrorBody(Object.assign(new Error('request entity too large'), { type: 'entity.too.large', status: 413, limit: 5 * 1024 * 1024 }))).toEqual({
      statusCode: 413,
      message: 'The request body is larger than the 5 MB limit',
      code: 'body_too_large',
    });
    expect(bodyParserErrorBody(Object.assign(new Error('nests deeper than 32 levels'), { type: JSON_TOO_DEEP, status: 400 }))).toMatchObject({ statusCode: 400, code: 'body_too_deep' });
    expect(bodyParserErrorBody(Object.assign(new Error('boom'), { type: 'entity.too.large', status: 500 }))).toBeUndefined();
    expect(bodyParserErrorBody(new Error('plain'))).toBeUndefined();
  });
});
