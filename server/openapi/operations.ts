// Every API operation with the shared zod schemas that validate it. The OpenAPI document
// and the reference page are generated from this list; a test checks it against the
// routes Express actually serves, so the two cannot drift apart.
import { z } from 'zod';
import * as auth from '../../shared/api/auth';
import * as ws from '../../shared/api/workspaces';
import * as profiles from '../../shared/api/profiles';
import * as fields from '../../shared/api/fields';
import * as strategies from '../../shared/api/strategies';
import * as scenarios from '../../shared/api/scenarios';
import * as projections from '../../shared/api/projections';
import * as tokens from '../../shared/api/tokens';

export type Operation = {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** Express-style path under /api, e.g. /workspaces/:workspaceId/fields. */
  path: string;
  tag: string;
  summary: string;
  /** Who may call it: nobody signed in, a session only, or a session or API token, with the least role. */
  access: 'public' | 'session' | { role: auth.Role };
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  response?: z.ZodType;
  status?: number;
  produces?: 'application/json' | 'text/csv';
};

const list = <T extends z.ZodType>(s: T) => z.array(s);
const viewer = { role: 'viewer' } as const;
const editor = { role: 'editor' } as const;
const owner = { role: 'owner' } as const;

function crud(
  tag: string,
  base: string,
  item: string,
  params: z.ZodType,
  body: z.ZodType,
  view: z.ZodType,
  what: string,
): Operation[] {
  return [
    {
      method: 'get',
      path: base,
      tag,
      summary: `List ${what}s`,
      access: viewer,
      params: ws.workspaceParams,
      response: list(view),
    },
    {
      method: 'post',
      path: base,
      tag,
      summary: `Create a ${what}`,
      access: editor,
      params: ws.workspaceParams,
      body,
      response: view,
      status: 201,
    },
    {
      method: 'get',
      path: `${base}/${item}`,
      tag,
      summary: `Read a ${what}`,
      access: viewer,
      params,
      response: view,
    },
    {
      method: 'put',
      path: `${base}/${item}`,
      tag,
      summary: `Replace a ${what}`,
      access: editor,
      params,
      body,
      response: view,
    },
    {
      method: 'delete',
      path: `${base}/${item}`,
      tag,
      summary: `Delete a ${what}`,
      access: editor,
      params,
      status: 204,
    },
  ];
}

const W = '/workspaces/:workspaceId';

export const operations: Operation[] = [
  { method: 'get', path: '/health', tag: 'System', summary: 'Service and database status', access: 'public' },
  {
    method: 'get',
    path: '/openapi.json',
    tag: 'System',
    summary: 'This reference as an OpenAPI 3.0 document',
    access: 'public',
  },
  {
    method: 'get',
    path: '/docs',
    tag: 'System',
    summary: 'This reference as a readable page',
    access: 'public',
  },
  {
    method: 'post',
    path: '/auth/sign-up',
    tag: 'Account',
    summary: 'Create an account and a personal workspace',
    access: 'public',
    body: auth.signUpBody,
    response: auth.sessionView,
    status: 201,
  },
  {
    method: 'post',
    path: '/auth/sign-in',
    tag: 'Account',
    summary: 'Sign in (rate-limited per account and address)',
    access: 'public',
    body: auth.signInBody,
    response: auth.sessionView,
  },
  {
    method: 'post',
    path: '/auth/sign-out',
    tag: 'Account',
    summary: 'Sign out',
    access: 'public',
    status: 204,
  },
  {
    method: 'get',
    path: '/auth/me',
    tag: 'Account',
    summary: 'The signed-in user and their workspaces',
    access: 'session',
    response: auth.sessionView,
  },
  {
    method: 'patch',
    path: '/account',
    tag: 'Account',
    summary: 'Change your name',
    access: 'session',
    body: auth.updateAccountBody,
    response: auth.userView,
  },
  {
    method: 'post',
    path: '/account/password',
    tag: 'Account',
    summary: 'Change your password (ends other sessions)',
    access: 'session',
    body: auth.changePasswordBody,
    status: 204,
  },
  {
    method: 'get',
    path: '/account/tokens',
    tag: 'API tokens',
    summary: 'List your API tokens',
    access: 'session',
    response: list(tokens.tokenView),
  },
  {
    method: 'post',
    path: '/account/tokens',
    tag: 'API tokens',
    summary: 'Create an API token (its secret is shown once)',
    access: 'session',
    body: tokens.createTokenBody,
    response: tokens.createdToken,
    status: 201,
  },
  {
    method: 'delete',
    path: '/account/tokens/:tokenId',
    tag: 'API tokens',
    summary: 'Revoke an API token',
    access: 'session',
    params: tokens.tokenParams,
    status: 204,
  },
  {
    method: 'get',
    path: '/workspaces',
    tag: 'Workspaces',
    summary: 'Your workspaces and roles',
    access: 'session',
    response: list(ws.workspaceView),
  },
  {
    method: 'post',
    path: '/workspaces',
    tag: 'Workspaces',
    summary: 'Create a workspace you own',
    access: 'session',
    body: ws.createWorkspaceBody,
    response: ws.workspaceView,
    status: 201,
  },
  {
    method: 'get',
    path: W,
    tag: 'Workspaces',
    summary: 'Read a workspace',
    access: viewer,
    params: ws.workspaceParams,
    response: ws.workspaceView,
  },
  {
    method: 'get',
    path: `${W}/members`,
    tag: 'Workspaces',
    summary: 'List members',
    access: viewer,
    params: ws.workspaceParams,
    response: list(ws.memberView),
  },
  {
    method: 'post',
    path: `${W}/members`,
    tag: 'Workspaces',
    summary: 'Add an existing account as a member',
    access: owner,
    params: ws.workspaceParams,
    body: ws.addMemberBody,
    response: ws.memberView,
    status: 201,
  },
  {
    method: 'patch',
    path: `${W}/members/:userId`,
    tag: 'Workspaces',
    summary: "Change a member's role",
    access: owner,
    params: ws.memberParams,
    body: ws.changeRoleBody,
    response: ws.memberView,
  },
  {
    method: 'delete',
    path: `${W}/members/:userId`,
    tag: 'Workspaces',
    summary: 'Remove a member',
    access: owner,
    params: ws.memberParams,
    status: 204,
  },
  ...crud(
    'Species profiles',
    `${W}/profiles`,
    ':profileId',
    profiles.profileParams,
    profiles.profileBody,
    profiles.profileView,
    'species profile',
  ),
  {
    method: 'post',
    path: `${W}/profiles/:profileId/copy`,
    tag: 'Species profiles',
    summary: 'Copy a profile (built-in ones are read-only)',
    access: editor,
    params: profiles.profileParams,
    response: profiles.profileView,
    status: 201,
  },
  ...crud(
    'Fields',
    `${W}/fields`,
    ':fieldId',
    fields.fieldParams,
    fields.fieldBody,
    fields.fieldView,
    'field',
  ),
  ...crud(
    'Strategies',
    `${W}/strategies`,
    ':strategyId',
    strategies.strategyParams,
    strategies.strategyBody,
    strategies.strategyView,
    'strategy',
  ),
  ...crud(
    'Scenarios',
    `${W}/scenarios`,
    ':scenarioId',
    scenarios.scenarioParams,
    scenarios.scenarioBody,
    scenarios.scenarioView,
    'scenario',
  ),
  {
    method: 'post',
    path: `${W}/scenarios/:scenarioId/runs`,
    tag: 'Projections',
    summary:
      'Launch projections: every strategy, the no-control baseline, optionally a let-it-seed variant (202; 429 when the queue is full)',
    access: editor,
    params: scenarios.scenarioParams,
    body: scenarios.launchBody,
    response: projections.launchResponse,
    status: 202,
  },
  {
    method: 'get',
    path: `${W}/projections`,
    tag: 'Projections',
    summary: 'Recent projections with status and progress',
    access: viewer,
    params: ws.workspaceParams,
    query: projections.listProjectionsQuery,
    response: list(projections.projectionListItem),
  },
  {
    method: 'get',
    path: `${W}/projections/:projectionId`,
    tag: 'Projections',
    summary: 'A projection with its input snapshot and result',
    access: viewer,
    params: projections.projectionParams,
    response: projections.projectionView,
  },
  {
    method: 'post',
    path: `${W}/projections/:projectionId/cancel`,
    tag: 'Projections',
    summary: 'Cancel a queued or running projection',
    access: editor,
    params: projections.projectionParams,
    response: projections.projectionView,
  },
  {
    method: 'get',
    path: `${W}/projections/:projectionId/replicates.csv`,
    tag: 'Projections',
    summary: 'Per-replicate trajectories as CSV (re-computed from the snapshot and seed)',
    access: viewer,
    params: projections.projectionParams,
    produces: 'text/csv',
  },
  {
    method: 'get',
    path: `${W}/batches/:batchId`,
    tag: 'Projections',
    summary: 'All projections of one launch (for comparison)',
    access: viewer,
    params: projections.batchParams,
    response: list(projections.projectionView),
  },
];
