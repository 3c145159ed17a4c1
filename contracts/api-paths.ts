/**
 * The JSON API's paths, built in one place for every client (the browser's hooks, the CLI, the tests); each id
 * is URL-encoded. The route handlers live at the same paths under app/api/.
 */
const at = encodeURIComponent;

const project = (projectId: string) => `/api/projects/${at(projectId)}`;
const scenarios = (projectId: string) => `${project(projectId)}/scenarios`;
const scenario = (projectId: string, scenarioId: string) => `${scenarios(projectId)}/${at(scenarioId)}`;

export const apiPaths = {
  account: "/api/account",
  accountSessions: "/api/account/sessions",
  signUp: "/api/users",
  passwordReset: "/api/password-reset",
  passwordResetConfirm: "/api/password-reset/confirm",
  adminUsers: "/api/admin/users",
  adminUser: (userId: string) => `/api/admin/users/${at(userId)}`,
  compute: "/api/compute",
  sweeps: "/api/sweeps",
  maps: "/api/maps",
  map: (mapId: string) => `/api/maps/${at(mapId)}`,

  projects: "/api/projects",
  project,
  members: (projectId: string) => `${project(projectId)}/members`,
  member: (projectId: string, userId: string) => `${project(projectId)}/members/${at(userId)}`,
  invitations: (projectId: string) => `${project(projectId)}/invitations`,
  invitation: (projectId: string, invitationId: string) => `${project(projectId)}/invitations/${at(invitationId)}`,
  acceptInvitation: (token: string) => `/api/invitations/${at(token)}/accept`,
  audit: (projectId: string) => `${project(projectId)}/audit`,
  ownership: (projectId: string) => `${project(projectId)}/ownership`,

  scenarios,
  scenarioImport: (projectId: string) => `${scenarios(projectId)}/import`,
  scenario,
  revision: (projectId: string, scenarioId: string, version: number) => `${scenario(projectId, scenarioId)}/revisions/${version}`,
  shareLinks: (projectId: string, scenarioId: string) => `${scenario(projectId, scenarioId)}/share-links`,
  shareLink: (projectId: string, scenarioId: string, linkId: string) => `${scenario(projectId, scenarioId)}/share-links/${at(linkId)}`,
  sequencerProfile: (projectId: string, scenarioId: string) => `${scenario(projectId, scenarioId)}/sequencer-profile`,
  attachments: (projectId: string, scenarioId: string) => `${scenario(projectId, scenarioId)}/attachments`,
  scenarioMaps: (projectId: string, scenarioId: string) => `${scenario(projectId, scenarioId)}/maps`,
  attachment: (projectId: string, scenarioId: string, attachmentId: string) => `${scenario(projectId, scenarioId)}/attachments/${at(attachmentId)}`,
} as const;
