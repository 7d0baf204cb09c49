// The one door to the API: same-origin fetch with the session cookie, replies parsed by the shared zod schemas.
import { z } from 'zod';
import { apiErrorSchema } from '@/shared/api';

/** Codes the app itself gives to failures that never got a well-formed answer from the server. */
export const CLIENT_ERROR_CODES = { network: 'NETWORK_ERROR', badResponse: 'BAD_RESPONSE' } as const;

/** A failed request: HTTP status (0 when the server was never reached), the server's code and message. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  /** Per-field problems the server listed (VALIDATION_FAILED), located by JSON paths such as `$.endsAt`. */
  readonly details: readonly { path: string; message: string }[];

  constructor(status: number, code: string, message: string, details: readonly { path: string; message: string }[] = []) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

// Web builds are served by the API itself, so a relative path is same-origin; a native build would set this.
const API_BASE_URL = process.env.EXPO_PUBLIC_API_URL ?? '';

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return null;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

// Optional beside the contract's { code, message }: forms place these next to their fields.
const errorDetailsSchema = z.object({ error: z.object({ details: z.array(z.object({ path: z.string(), message: z.string() })) }) });

/**
 * Server messages written for API clients, not for people: the app says these in its own words. An unknown route
 * is also what a tenant user gets for staff-only data (the server does not confirm that it exists).
 */
const PERSON_WORDING: Readonly<Record<string, string>> = {
  ROUTE_NOT_FOUND: 'This is not available to you. Use the areas in the menu to find what you are looking for.',
};
const UNREADABLE_REPLY = 'Slackwater answered in a way this screen cannot read. Try again; if it keeps happening, tell your administrator.';

function errorFromReply(status: number, body: unknown): ApiError {
  const parsed = apiErrorSchema.safeParse(body);
  const details = errorDetailsSchema.safeParse(body);
  if (parsed.success) {
    const { code, message } = parsed.data.error;
    return new ApiError(status, code, PERSON_WORDING[code] ?? message, details.success ? details.data.error.details : []);
  }
  return new ApiError(status, CLIENT_ERROR_CODES.badResponse, UNREADABLE_REPLY);
}

/**
 * Calls `path` on the API and returns the reply parsed by `schema`.
 * Throws ApiError for non-2xx replies, unreachable servers and replies that do not match the contract.
 */
export async function apiFetch<S extends z.ZodType>(path: string, schema: S, init: RequestInit = {}): Promise<z.infer<S>> {
  let response: Response;
  try {
    response = await fetch(`${API_BASE_URL}${path}`, {
      ...init,
      credentials: 'include',
      // Only string bodies are JSON here; FormData (uploads) must let fetch write its own multipart boundary.
      headers: { Accept: 'application/json', ...(typeof init.body === 'string' ? { 'Content-Type': 'application/json' } : {}), ...init.headers },
    });
  } catch {
    throw new ApiError(0, CLIENT_ERROR_CODES.network, 'Could not reach the Slackwater server. Check your connection and try again.');
  }
  const body = await readJson(response);
  if (!response.ok) throw errorFromReply(response.status, body);
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    throw new ApiError(response.status, CLIENT_ERROR_CODES.badResponse, UNREADABLE_REPLY);
  }
  return parsed.data;
}

/** JSON body helper so call sites read `apiFetch(path, schema, jsonBody('POST', input))`. */
export function jsonBody(method: 'POST' | 'PUT' | 'PATCH' | 'DELETE', body?: unknown): RequestInit {
  return { method, body: body === undefined ? undefined : JSON.stringify(body) };
}
