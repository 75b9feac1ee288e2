import type { Role } from '../../../../shared/api/auth';

/** How each role is named and what it allows, worded once for every page that explains roles. */
export const roleNames: Record<Role, string> = { owner: 'Owner', editor: 'Editor', viewer: 'Viewer' };

export const roleSummaries: Record<Role, string> = {
  owner: 'Adds and removes members, sets their roles, and does everything an editor does.',
  editor: 'Creates fields, species profiles and strategies, and runs projections and sweeps.',
  viewer: 'Reads what the workspace holds and shares; changes nothing.',
};
