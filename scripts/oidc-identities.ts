// Invented people and groups of the local OpenID Connect issuer (scripts/oidc-issuer.ts). Sign in at its page with
// the login name; the password field takes anything: the issuer is a stand-in for a company's own.
export type DevIdentity = { login: string; name: string; email: string; groups: string[] };

/** The demo maps these groups to roles (db/seed/seed-sso.ts): admins, engineers, planners, approvers. */
export const DEV_GROUPS = ['slackwater-admins', 'noc-engineers', 'network-planning', 'change-board', 'facilities'] as const;

export const DEV_IDENTITIES: DevIdentity[] = [
  { login: 'ines', name: 'Ines Okonkwo-Berg', email: 'ines.okonkwo-berg@harbourline.test', groups: ['slackwater-admins'] },
  { login: 'tomas', name: 'Tomás Lindqvist', email: 'tomas.lindqvist@harbourline.test', groups: ['noc-engineers'] },
  { login: 'priya', name: 'Priya Castellanos', email: 'priya.castellanos@harbourline.test', groups: ['network-planning'] },
  { login: 'mette', name: 'Mette Abara', email: 'mette.abara@harbourline.test', groups: ['change-board', 'network-planning'] },
  // In no group the demo maps: single sign-on refuses her with "no access".
  { login: 'jun', name: 'Jun Halvorsen', email: 'jun.halvorsen@harbourline.test', groups: ['facilities'] },
];
