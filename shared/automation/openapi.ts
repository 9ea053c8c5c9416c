/**
 * The OpenAPI 3.1 description of the automation API (`GET /api/v1/openapi.json`), written by hand and kept
 * beside the routes' schemas; `tests/server/automation-api.test.ts` checks it names every v1 route.
 */
import { ACCESS_TOKEN_MAX_DAYS } from '../types/access-token'
import { DOCUMENT_LIMITS } from '../network/limits'
import { API_SOLVE_LIMITS } from './api-solve'
import { SAFETY_NOTE } from '../solver/safety-note'

const uuid = { type: 'string', format: 'uuid' } as const
const frequency = {
  oneOf: [{ type: 'number', minimum: 0, description: 'hertz' }, { type: 'string', maxLength: 100, description: 'a value with units, e.g. "2.45 GHz"' }],
} as const
const errorBody = (description: string) => ({
  description,
  content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } },
})

/** Builds the description; `solvesPerMinute` is the server's configured limit. */
export function automationOpenApi(solvesPerMinute: number) {
  return {
    openapi: '3.1.0',
    info: {
      title: 'Portwright automation API',
      version: '1',
      description: [
        'Solve network documents and stored networks from scripts. Authenticate with a personal access token',
        `(created on the account page, shown once, at most ${ACCESS_TOKEN_MAX_DAYS} days of life) as "Authorization: Bearer pwt_…".`,
        'A token reaches only the projects chosen when it was made, with the lower of its role ceiling and its',
        'owner\'s current role in each; a project outside that answers 404. Browser sessions do not work here, and',
        'tokens work nowhere else.',
        `Results are simulations. ${SAFETY_NOTE}`,
      ].join(' '),
    },
    servers: [{ url: '/' }],
    security: [{ accessToken: [] }],
    paths: {
      '/api/v1/solve': {
        post: {
          operationId: 'solve',
          summary: 'Solve a document, or a stored network, to S-parameters',
          description: [
            'Send either a network document (contract version 1 or 1.1), with an optional project whose networks its',
            'subnetwork blocks refer to (by id or name), or a project and the id of a network stored there. The answer',
            'is the same JSON as `npm run -s solve -- FILE.json --format json`: s[k][i][j] = S(i+1)(j+1) at',
            `frequencies[k], as [re, im]. At most ${API_SOLVE_LIMITS.points.toLocaleString('en')} points and`,
            `${API_SOLVE_LIMITS.values.toLocaleString('en')} S-parameter values (ports² × points) per request; each solve`,
            `runs within the server's time and memory budget. At most ${solvesPerMinute} solves a minute per token.`,
          ].join(' '),
          requestBody: {
            required: true,
            content: {
              'application/json': {
                schema: {
                  oneOf: [
                    {
                      type: 'object',
                      required: ['document'],
                      additionalProperties: false,
                      properties: {
                        document: { type: 'object', description: 'A network document as the contract defines it ("format": "portwright.network").' },
                        project: { ...uuid, description: 'Project whose networks the document\'s subnetworks refer to; needs the token\'s scope.' },
                        sweep: { $ref: '#/components/schemas/SweepOverride' },
                      },
                    },
                    {
                      type: 'object',
                      required: ['project', 'network'],
                      additionalProperties: false,
                      properties: {
                        project: uuid,
                        network: { ...uuid, description: 'A network of that project (see GET /api/v1/networks).' },
                        sweep: { $ref: '#/components/schemas/SweepOverride' },
                      },
                    },
                  ],
                },
              },
            },
          },
          responses: {
            200: {
              description: 'The solve.',
              headers: { 'Portwright-Caution': { description: 'The simulation and RF-safety caution.', schema: { type: 'string' } } },
              content: { 'application/json': { schema: { $ref: '#/components/schemas/SolveResult' } } },
            },
            400: errorBody('The body is not one of the two shapes; `data.fields` names each bad field.'),
            401: errorBody('No valid token (missing, unknown, revoked or expired).'),
            404: errorBody('The project is not in the token\'s scope, its owner is no longer a member, or the network is not there.'),
            413: errorBody('The body is over the server\'s limit (2 MiB by default).'),
            422: {
              description: 'The network cannot be solved: one problem per entry, naming the block and field, or the limit passed.',
              content: { 'application/json': { schema: { $ref: '#/components/schemas/Problems' } } },
            },
            429: {
              ...errorBody('The token has used its solves for this minute.'),
              headers: { 'Retry-After': { description: 'Seconds until the next solve is allowed.', schema: { type: 'integer' } } },
            },
            503: errorBody('The server is solving too many networks at once.'),
          },
        },
      },
      '/api/v1/networks': {
        get: {
          operationId: 'listNetworks',
          summary: 'The networks of a project in the token\'s scope',
          parameters: [{ name: 'project', in: 'query', required: true, schema: uuid }],
          responses: {
            200: {
              description: 'Networks by name.',
              content: {
                'application/json': {
                  schema: {
                    type: 'array',
                    items: {
                      type: 'object',
                      required: ['id', 'name', 'revision', 'updatedAt'],
                      properties: { id: uuid, name: { type: 'string' }, revision: { type: 'integer' }, updatedAt: { type: 'string', format: 'date-time' } },
                    },
                  },
                },
              },
            },
            400: errorBody('The project parameter is missing or not an id.'),
            401: errorBody('No valid token.'),
            404: errorBody('The project is not in the token\'s scope, or its owner is no longer a member.'),
          },
        },
      },
      '/api/v1/token': {
        get: {
          operationId: 'describeToken',
          summary: 'What the calling token may do now',
          responses: {
            200: {
              description: 'The token\'s name, expiry, role ceiling and effective role in each project of its scope.',
              content: {
                'application/json': {
                  schema: {
                    type: 'object',
                    required: ['name', 'expiresAt', 'roleCeiling', 'projects'],
                    properties: {
                      name: { type: 'string' },
                      expiresAt: { type: 'string', format: 'date-time' },
                      roleCeiling: { enum: ['viewer', 'reviewer', 'editor'] },
                      projects: {
                        type: 'array',
                        items: {
                          type: 'object',
                          required: ['id', 'name', 'role'],
                          properties: { id: uuid, name: { type: 'string' }, role: { enum: ['viewer', 'reviewer', 'editor', 'owner'] } },
                        },
                      },
                    },
                  },
                },
              },
            },
            401: errorBody('No valid token.'),
          },
        },
      },
      '/api/v1/openapi.json': {
        get: {
          operationId: 'openApi',
          summary: 'This description',
          security: [],
          responses: { 200: { description: 'OpenAPI 3.1 document.', content: { 'application/json': { schema: { type: 'object' } } } } },
        },
      },
    },
    components: {
      securitySchemes: {
        accessToken: { type: 'http', scheme: 'bearer', description: 'A personal access token, "pwt_" followed by 43 characters.' },
      },
      schemas: {
        SweepOverride: {
          type: 'object',
          additionalProperties: false,
          description: 'Replaces the named fields of the document\'s sweep.',
          properties: {
            start: frequency,
            stop: frequency,
            points: { type: 'integer', minimum: 1, maximum: DOCUMENT_LIMITS.sweepPoints },
            spacing: { enum: ['linear', 'log'] },
          },
        },
        SolveResult: {
          type: 'object',
          required: ['ports', 'impedances', 'frequencies', 's'],
          properties: {
            ports: { type: 'integer', minimum: 1 },
            impedances: { type: 'array', items: { type: 'number' }, description: 'Reference impedance of each port (ohm).' },
            frequencies: { type: 'array', items: { type: 'number' }, description: 'Hertz.' },
            s: {
              type: 'array',
              description: 's[k][i][j] = S(i+1)(j+1) at frequencies[k] as [re, im].',
              items: { type: 'array', items: { type: 'array', items: { type: 'array', prefixItems: [{ type: 'number' }, { type: 'number' }], minItems: 2, maxItems: 2 } } },
            },
          },
        },
        Problems: {
          type: 'object',
          required: ['statusCode', 'message', 'problems'],
          properties: { statusCode: { const: 422 }, message: { type: 'string' }, problems: { type: 'array', items: { type: 'string' } } },
        },
        Error: {
          type: 'object',
          required: ['statusCode', 'message'],
          properties: { statusCode: { type: 'integer' }, message: { type: 'string' }, data: { type: 'object' } },
        },
      },
    },
  } as const
}
