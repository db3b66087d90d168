import 'server-only';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { isAppError } from '@/lib/errors';

/** A route id that is not a UUID can name nothing: answer 404 before it reaches PostgreSQL. */
export function uuidOrNotFound(value: string): string {
  const parsed = z.uuid().safeParse(value);
  if (!parsed.success) notFound();
  return parsed.data;
}

/** Missing and cross-account rows both surface as a not_found AppError; a page shows them as Next's 404. */
export async function orNotFound<T>(load: Promise<T>): Promise<T> {
  try {
    return await load;
  } catch (err) {
    if (isAppError(err, 'not_found')) notFound();
    throw err;
  }
}

/** The first value of a search param, as pages receive them. */
export function firstParam(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}

export type SearchParams = Promise<Record<string, string | string[] | undefined>>;
