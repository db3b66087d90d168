// Who may call the calculate API and how much, as OpenAPI: kept apart from the sizing schema in openapi.ts.
// An API key is optional: without one a caller is limited per address (or per signed-in user, for the desk).

/** Every refusal: the whole list of `{ path, message }`. */
export const errorsRef = { $ref: '#/components/schemas/Errors' };
const errors = {
  type: 'object',
  required: ['errors'],
  properties: {
    errors: {
      type: 'array',
      items: {
        type: 'object',
        required: ['path', 'message'],
        properties: { path: { type: 'string' }, message: { type: 'string' } },
      },
    },
  },
};

const integerHeader = (description: string) => ({ description, schema: { type: 'integer', minimum: 0 } });

/** The RateLimit header fields every answer carries (IETF httpapi draft: limit, remaining, reset, policy). */
export const rateLimitResponseHeaders = {
  'RateLimit-Limit': integerHeader('requests a minute this caller may make'),
  'RateLimit-Remaining': integerHeader('requests left in the current minute'),
  'RateLimit-Reset': integerHeader('seconds until the current minute ends'),
  'RateLimit-Policy': {
    description: 'the limit, its window and whose budget it is (per API key, per signed-in user, per address)',
    schema: { type: 'string' },
  },
};

/** `Authorization: Bearer dwk_…`, created and revoked on the desk's API keys page. */
export const apiKeySecurityScheme = {
  apiKey: {
    type: 'http',
    scheme: 'bearer',
    bearerFormat: 'dwk_<8 characters>_<43 characters>',
    description:
      'An API key from the desk (API keys page): its own per-minute limit and daily count, and every request made ' +
      'with it is recorded in the audit trail under its account. Optional: without it a caller is limited per address.',
  },
};

/** Anonymous or with a key. */
export const calculateSecurity = [{}, { apiKey: [] }];

/** The answers about access, beside the sizing answers. */
export const accessResponses = {
  401: {
    description: 'The API key is unknown, revoked or its owner disabled (never downgraded to anonymous)',
    headers: { 'WWW-Authenticate': { schema: { type: 'string' } } },
    content: { 'application/json': { schema: errorsRef } },
  },
  429: {
    description: "Past the caller's limit for this minute",
    headers: { 'Retry-After': integerHeader('seconds to wait'), ...rateLimitResponseHeaders },
    content: { 'application/json': { schema: errorsRef } },
  },
  503: {
    description: 'An API key could not be checked because the database is unreachable; try again later',
    headers: { 'Retry-After': integerHeader('seconds to wait') },
    content: { 'application/json': { schema: errorsRef } },
  },
};

export const accessSchemas = { Errors: errors };
