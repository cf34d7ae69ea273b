/** The invented demo accounts the server seeds (SEED_DEMO=true) and their shared password. */
export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? 'wrenmoss-demo';

export const DEMO_USERS = {
  admin: 'admin@brackenfold.example',
  designer: 'designer@brackenfold.example',
  reviewer: 'reviewer@brackenfold.example',
  viewer: 'viewer@brackenfold.example',
} as const;
