import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { sessionOut, signupBody, tokenOut } from '../../shared/schemas/auth';
import { accessOf, flattenFields, groupByTag, listOperations, type JsonSchema, type OpenApiDocument } from './openapi';

// The shapes below are what zod 4's own z.toJSONSchema makes of our shared schemas, the
// same call the server's OpenAPI document is built with: the page must read that output.
const json = (schema: z.ZodType, io: 'input' | 'output') =>
  z.toJSONSchema(schema, { io, unrepresentable: 'any', target: 'draft-2020-12' }) as JsonSchema;

const doc: OpenApiDocument = {
  openapi: '3.1.0',
  info: { title: 'Farthing API', version: '1' },
  tags: [{ name: 'Auth' }, { name: 'Tokens' }],
  security: [{ bearer: [] }, { session: [] }],
  components: { schemas: { Token: json(tokenOut, 'output') } },
  paths: {
    '/api/tokens': {
      get: {
        tags: ['Tokens'],
        summary: 'List tokens',
        'x-access': 'tokens.own',
        responses: {
          '200': {
            description: 'Success',
            content: {
              'application/json': {
                schema: { type: 'object', properties: { items: { type: 'array', items: { $ref: '#/components/schemas/Token' } } } },
              },
            },
          },
        },
      },
    },
    '/api/auth/signup': {
      post: {
        tags: ['Auth'],
        summary: 'Create an account',
        'x-access': 'public',
        requestBody: { content: { 'application/json': { schema: json(signupBody, 'input') } } },
        responses: { '201': { description: 'Success', content: { 'application/json': { schema: json(sessionOut, 'output') } } } },
      },
    },
    '/api/members/{userId}': {
      delete: { tags: ['Members'], 'x-access': 'members.manage', parameters: [{ name: 'userId', in: 'path', schema: { type: 'string' } }] },
    },
    '/api/health': { get: { summary: 'Alive?' } },
  },
};

describe('API reference reading of the OpenAPI document', () => {
  const operations = listOperations(doc);
  const byPath = (path: string) => operations.find((operation) => operation.path === path)!;

  it('groups operations by tag in the document order, unknown tags after, untagged last', () => {
    expect(groupByTag(doc, operations).map((group) => group.tag)).toEqual(['Auth', 'Tokens', 'Members', 'Other']);
  });

  it('lists every request field with whether it is required and its limits', () => {
    const fields = byPath('/api/auth/signup').requestFields!;
    expect(fields.map((field) => field.path)).toEqual(['email', 'password', 'name', 'workspaceName']);
    expect(fields.every((field) => field.required)).toBe(true);
    const password = fields.find((field) => field.path === 'password')!;
    expect(password.constraints).toEqual(['min length 10', 'max length 200']);
    expect(fields[0].type).toBe('string (email)');
  });

  it('flattens nested objects and arrays of objects to dotted paths', () => {
    const paths = byPath('/api/auth/signup').responses[0].fields.map((field) => `${field.path}${field.required ? '*' : ''}`);
    expect(paths).toEqual([
      'user*',
      'user.id*',
      'user.email*',
      'user.name*',
      'workspace*',
      'workspace.id*',
      'workspace.name*',
      'role*',
      'workspaces',
      'workspaces[].id*',
      'workspaces[].name*',
      'workspaces[].role*',
    ]);
  });

  it('follows $ref and reads "or null"', () => {
    const fields = byPath('/api/tokens').responses[0].fields;
    expect(fields.find((field) => field.path === 'items')!.type).toBe('array of Token');
    expect(fields.find((field) => field.path === 'items[].lastUsedAt')!.type).toBe('string or null');
  });

  it('turns the access rule into the roles that may call', () => {
    expect(byPath('/api/members/{userId}').access).toEqual({ kind: 'roles', roles: ['owner'] });
    expect(byPath('/api/auth/signup').access).toEqual({ kind: 'public' });
    expect(byPath('/api/tokens').access).toEqual({ kind: 'roles', roles: ['owner', 'designer', 'buyer', 'viewer'] });
    expect(accessOf(doc, { 'x-access': 'signedIn' })).toEqual({ kind: 'signed-in' });
    expect(accessOf(doc, { security: [] })).toEqual({ kind: 'public' });
  });

  it('marks path parameters as required', () => {
    expect(byPath('/api/members/{userId}').parameters).toEqual([
      { path: 'userId', type: 'string · path', required: true, description: undefined, constraints: [] },
    ]);
  });

  it('survives a schema that refers to itself', () => {
    const looped: OpenApiDocument = {
      ...doc,
      components: {
        schemas: { Node: { type: 'object', properties: { name: { type: 'string' }, child: { $ref: '#/components/schemas/Node' } } } },
      },
    };
    const fields = flattenFields(looped, { $ref: '#/components/schemas/Node' });
    expect(fields.length).toBeGreaterThan(0);
    expect(fields.length).toBeLessThan(20);
    expect(fields[0]).toMatchObject({ path: 'name', type: 'string' });
  });
});
