// The account's data is the signed-in user, cached by the auth feature; this feature
// only changes it, so it has mutation keys and no queries of its own.
export const accountKeys = {
  all: ['account'] as const,
  updateProfile: () => [...accountKeys.all, 'update-profile'] as const,
  updateUnits: () => [...accountKeys.all, 'update-units'] as const,
  changePassword: () => [...accountKeys.all, 'change-password'] as const,
};
