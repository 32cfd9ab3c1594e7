import { apiRequest, type RequestOptions } from './api-client';
import type { paths } from './api-contract';

/**
 * `apiRequest` typed by the generated contract: the path is the API's own template (`/guides/{workshopSlug}/{guideSlug}`),
 * and its method picks the path parameters, the query and the answer from `paths`. A renamed route, a changed query
 * or a changed answer fails the studio's type check instead of a page at run time.
 */

type HttpMethod = 'get' | 'put' | 'post' | 'patch' | 'delete';

/** The contract's paths without the `/api` prefix `apiRequest` adds. */
type ApiPathOf<Full> = Full extends `/api${infer Path}` ? Path : never;
type FullPath<Path extends string> = `/api${Path}` & keyof paths;

/** The paths that answer `method`. */
export type ApiPath<M extends HttpMethod> = {
  [Full in keyof paths]: paths[Full] extends { [K in M]: object } ? ApiPathOf<Full> : never;
}[keyof paths];

type Operation<M extends HttpMethod, Path extends ApiPath<M>> = paths[FullPath<Path>][M];

type PathParams<Op> = Op extends { parameters: { path: infer Params } } ? Params : never;
type QueryParams<Op> = Op extends { parameters: { query?: infer Query } } ? NonNullable<Query> : never;
type JsonBody<Op> = Op extends { requestBody?: infer Request }
  ? [NonNullable<Request>] extends [never]
    ? never
    : NonNullable<Request> extends { content: { 'application/json': infer Body } }
      ? Body
      : never
  : never;

type SuccessCode = 200 | 201 | 202 | 203;
/** The answer of a success status: its JSON body, or null for 204 (as `apiRequest` gives it). */
export type ApiAnswer<Op> = Op extends { responses: infer Responses }
  ? {
      [Code in keyof Responses]: Code extends SuccessCode
        ? Responses[Code] extends { content: { 'application/json': infer Body } }
          ? Body
          : never
        : Code extends 204
          ? null
          : never;
    }[keyof Responses]
  : never;

type Maybe<Key extends string, Value> = [Value] extends [never] ? { [K in Key]?: never } : { [K in Key]: Value };
type MaybeOptional<Key extends string, Value> = [Value] extends [never] ? { [K in Key]?: never } : { [K in Key]?: Value };

export type ApiCallOptions<Op> = Omit<RequestOptions, 'method' | 'body' | 'query'> &
  Maybe<'path', PathParams<Op>> &
  MaybeOptional<'query', QueryParams<Op>> &
  Maybe<'body', JsonBody<Op>>;

/** The options may be left out when the route needs no path parameters and no body. */
type OptionsArgument<Op> = object extends ApiCallOptions<Op> ? [options?: ApiCallOptions<Op>] : [options: ApiCallOptions<Op>];

/** `/guides/{workshopSlug}/{guideSlug}` with each parameter URL-encoded in its place. */
export function fillPath(template: string, params: Record<string, string | number> = {}): string {
  return template.replace(/\{(\w+)\}/g, (_, name: string) => {
    const value = params[name];
    if (value === undefined) throw new Error(`The path ${template} needs a value for {${name}}`);
    return encodeURIComponent(String(value));
  });
}

function call<M extends HttpMethod>(method: M) {
  return <Path extends ApiPath<M>>(path: Path, ...[options]: OptionsArgument<Operation<M, Path>>): Promise<ApiAnswer<Operation<M, Path>>> => {
    const { path: params, query, body, ...rest } = (options ?? {}) as {
      path?: Record<string, string | number>;
      query?: RequestOptions['query'];
      body?: unknown;
    } & Omit<RequestOptions, 'method' | 'body' | 'query'>;
    return apiRequest(fillPath(path, params), { ...rest, method: method.toUpperCase() as RequestOptions['method'], query, body });
  };
}

/** The API by path and method: `api.get('/guides/{workshopSlug}/{guideSlug}', { path: { workshopSlug, guideSlug } })`. */
export const api = {
  get: call('get'),
  post: call('post'),
  put: call('put'),
  patch: call('patch'),
  delete: call('delete'),
};
