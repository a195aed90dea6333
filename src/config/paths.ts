/**
 * Every URL the client knows, as a pattern for the router and a builder for links.
 * Routes and links import from here; no component writes a path by hand.
 */

/** Only same-site, absolute paths may be used as a post-sign-in destination. */
export function safeRedirectTarget(value: string | null | undefined): string | null {
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) {
    return null;
  }
  return value;
}

export const paths = {
  home: { pattern: '/', build: () => '/' },

  signIn: {
    pattern: '/sign-in',
    build: (redirectTo?: string | null) => {
      const target = safeRedirectTarget(redirectTo);
      return target && target !== '/'
        ? `/sign-in?redirectTo=${encodeURIComponent(target)}`
        : '/sign-in';
    },
  },
  signUp: { pattern: '/sign-up', build: () => '/sign-up' },
  forgotPassword: { pattern: '/forgot-password', build: () => '/forgot-password' },
  resetPassword: {
    pattern: '/reset-password',
    build: (token?: string) =>
      token ? `/reset-password?token=${encodeURIComponent(token)}` : '/reset-password',
  },

  makes: {
    pattern: '/makes',
    /** `newFromPattern`: open the new-make form with that pattern chosen (the library links here). */
    build: (options: { newFromPattern?: string; archived?: boolean } = {}) => {
      const query = new URLSearchParams();
      if (options.archived) query.set('show', 'archived');
      if (options.newFromPattern) query.set('new', options.newFromPattern);
      const search = query.toString();
      return search ? `/makes?${search}` : '/makes';
    },
  },
  /** One make's workspace. */
  make: { pattern: '/makes/:id', build: (id: string) => `/makes/${encodeURIComponent(id)}` },
  patterns: { pattern: '/patterns', build: () => '/patterns' },
  /** One pattern: its review and labelling (owner) or a read-only view. */
  patternReview: { pattern: '/patterns/:id', build: (id: string) => `/patterns/${encodeURIComponent(id)}` },
  fitPlanner: { pattern: '/fit-planner', build: () => '/fit-planner' },
  fabrics: { pattern: '/fabrics', build: () => '/fabrics' },
  library: { pattern: '/library', build: () => '/library' },
  coaching: { pattern: '/coaching', build: () => '/coaching' },

  account: { pattern: '/account', build: () => '/account' },

  adminUsers: { pattern: '/admin/users', build: () => '/admin/users' },
  adminOutbox: { pattern: '/admin/outbox', build: () => '/admin/outbox' },
} as const;
