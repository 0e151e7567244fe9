/** The team of one stand and its pending invitations. */
export const settingsKeys = {
  all: ['settings'] as const,
  members: (sugarbushId: number) => [...settingsKeys.all, 'members', sugarbushId] as const,
  memberPage: (sugarbushId: number, page: number) =>
    [...settingsKeys.members(sugarbushId), page] as const,
  invitations: (sugarbushId: number) => [...settingsKeys.all, 'invitations', sugarbushId] as const,
  invitationPage: (sugarbushId: number, page: number) =>
    [...settingsKeys.invitations(sugarbushId), page] as const,
};
