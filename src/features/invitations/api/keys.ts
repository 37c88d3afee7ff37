export const invitationKeys = {
  all: ['invitations'] as const,
  detail: (token: string) => [...invitationKeys.all, 'detail', token] as const,
};
