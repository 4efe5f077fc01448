import type { Request } from 'express';
import type { z } from 'zod';
import { check } from '../../src/contracts/problems';
import type { Problem } from '../../src/contracts/problems';
import { AppError } from './app-error';

function where(problems: Problem[], root: string): Problem[] {
  return problems.map((p) => (p.path === '(file)' ? { ...p, path: root } : p));
}

/** Parses the JSON body with a shared schema; every problem at once, as 400 invalid_input. */
export function parseBody<S extends z.ZodType>(schema: S, req: Request, options: { optional?: boolean } = {}): z.output<S> {
  let body: unknown = req.body;
  if (body === undefined) {
    const length = req.headers['content-length'];
    const empty = (length === undefined || length === '0') && !req.headers['transfer-encoding'];
    if (options.optional && empty) body = {};
    else if (!req.is('application/json')) throw new AppError('unsupported_media_type', 'Send the body as JSON (Content-Type: application/json).');
  }
  const checked = check(schema, body);
  if (!checked.ok) throw new AppError('invalid_input', 'Some fields are not valid.', where(checked.problems, '(body)'));
  return checked.value;
}

/** Parses the query string with a shared schema. */
export function parseQuery<S extends z.ZodType>(schema: S, req: Request): z.output<S> {
  const checked = check(schema, req.query);
  if (!checked.ok) throw new AppError('invalid_input', 'Some query parameters are not valid.', where(checked.problems, '(query)'));
  return checked.value;
}

/** Parses one header with a schema; `name` appears as the problem's path. */
export function parseHeader<S extends z.ZodType>(schema: S, req: Request, name: string): z.output<S> {
  const checked = check(schema, req.get(name));
  if (!checked.ok) throw new AppError('invalid_input', `The ${name} header is not valid.`, checked.problems.map((p) => ({ ...p, path: name })));
  return checked.value;
}

/** A path parameter that must be a server id; anything else cannot name a row, so it is 404. */
export function idParam(req: Request, name: string): string {
  const value = req.params[name];
  if (typeof value !== 'string' || !/^[A-Za-z0-9_-]{1,64}$/.test(value)) throw new AppError('not_found', 'There is nothing at this address.');
  return value;
}
