/** Every route of the studio in one place, so links and the router agree. */
export const paths = {
  home: '/',
  status: '/status',
  // Fit data of a workshop: each route has its pattern (for the router) and a builder (for links).
  builds: { path: '/workshops/:workshopId/builds', to: (workshopId: string) => `/workshops/${workshopId}/builds` },
  build: {
    path: '/workshops/:workshopId/builds/:buildId',
    to: (workshopId: string, buildId: string) => `/workshops/${workshopId}/builds/${buildId}`,
  },
  parts: { path: '/workshops/:workshopId/parts', to: (workshopId: string) => `/workshops/${workshopId}/parts` },
  part: {
    path: '/workshops/:workshopId/parts/:partId',
    to: (workshopId: string, partId: string) => `/workshops/${workshopId}/parts/${partId}`,
  },
  assembly: {
    path: '/workshops/:workshopId/assemblies/:assemblyId',
    to: (workshopId: string, assemblyId: string) => `/workshops/${workshopId}/assemblies/${assemblyId}`,
  },
  // The footage player (a build's page lists and uploads its footage); ?t= seconds to start at.
  footage: {
    path: '/workshops/:workshopId/footage/:footageId',
    to: (workshopId: string, footageId: string, atMs?: number) =>
      `/workshops/${workshopId}/footage/${footageId}${atMs === undefined ? '' : `?t=${(atMs / 1000).toFixed(1)}`}`,
  },
  // The creator's guide editor (a build's page lists its guides); the public page is publicGuide.
  guide: {
    path: '/workshops/:workshopId/guides/:guideId',
    to: (workshopId: string, guideId: string) => `/workshops/${workshopId}/guides/${guideId}`,
  },
  fitCalculator: '/tools/fit-calculator',
  // The public fit finder; its form lives in the address (?splineTeeth=21&splinePitch=16/32…), so a search can be shared.
  fitFinder: '/fit-finder',
  // Published guides, open to everyone: the index and the follow-along view.
  guideIndex: '/guides',
  publicGuide: {
    path: '/guides/:workshopSlug/:guideSlug',
    to: (workshopSlug: string, guideSlug: string) => `/guides/${encodeURIComponent(workshopSlug)}/${encodeURIComponent(guideSlug)}`,
  },
  // A published guide's revisions: the list, one revision read-only, and two compared (?from=&to=).
  guideRevisions: {
    path: '/guides/:workshopSlug/:guideSlug/revisions',
    to: (workshopSlug: string, guideSlug: string) => `/guides/${encodeURIComponent(workshopSlug)}/${encodeURIComponent(guideSlug)}/revisions`,
  },
  guideRevision: {
    path: '/guides/:workshopSlug/:guideSlug/revisions/:number',
    to: (workshopSlug: string, guideSlug: string, number: number) =>
      `/guides/${encodeURIComponent(workshopSlug)}/${encodeURIComponent(guideSlug)}/revisions/${number}`,
  },
  guideCompare: {
    path: '/guides/:workshopSlug/:guideSlug/compare',
    to: (workshopSlug: string, guideSlug: string, from: number, to: number) =>
      `/guides/${encodeURIComponent(workshopSlug)}/${encodeURIComponent(guideSlug)}/compare?from=${from}&to=${to}`,
  },
  // One search over published guides (and, signed in, one's own workshops): ?q=&kind=&state=&vehicle=&page=.
  search: '/search',
  // Accounts (the e-mailed links use verifyEmail, resetPassword, confirmEmail and acceptInvitation with ?token=).
  signIn: '/sign-in',
  signUp: '/sign-up',
  verifyEmail: '/verify-email',
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  confirmEmail: '/confirm-email',
  account: '/account',
  // Workshops and their members.
  workshops: '/workshops',
  workshop: { path: '/workshops/:workshopId', to: (workshopId: string) => `/workshops/${workshopId}` },
  workshopSettings: {
    path: '/workshops/:workshopId/settings',
    to: (workshopId: string) => `/workshops/${workshopId}/settings`,
  },
  workshopMembers: {
    path: '/workshops/:workshopId/members',
    to: (workshopId: string) => `/workshops/${workshopId}/members`,
  },
  // Fit reports sent to a workshop from its published guides (?status= filters them).
  workshopFitReports: {
    path: '/workshops/:workshopId/fit-reports',
    to: (workshopId: string) => `/workshops/${workshopId}/fit-reports`,
  },
  acceptInvitation: '/invitations/accept',
  // The "stop invitations to this address" link in every invitation mail (?token=), open to everyone.
  invitationOptOut: '/invitations/stop',
  // The stop link in every fit-news e-mail (?token=), open to everyone.
  unsubscribe: '/unsubscribe',
  // The preferences link in every mail (?token=), open to everyone: delivery per follow, digest hour and zone.
  mailPreferences: '/mail-preferences',
  // Site administration.
  adminUsers: '/admin/users',
  adminWorkshops: '/admin/workshops',
} as const;
