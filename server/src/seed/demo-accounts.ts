import type { GlobalRole } from '@channelwright/shared/schemas';

// Invented demo data: Brackenfold Semiconductor is a made-up design house; the accounts use the
// reserved .example domain (RFC 2606).

/** The one password of every demo account. Published in README.md; never seeded under NODE_ENV=production. */
export const DEMO_PASSWORD = 'wrenmoss-demo';

export interface DemoAccount {
  email: string;
  displayName: string;
  role: GlobalRole;
  processMaintainer: boolean;
  /** Reads the whole process library (the viewer sees only what the demo project uses). */
  libraryAccess: boolean;
  /** What this person does in the demo. */
  job: string;
}

export const DEMO_ACCOUNTS = {
  admin: {
    email: 'admin@brackenfold.example',
    displayName: 'Brackenfold Admin',
    role: 'admin',
    processMaintainer: true,
    libraryAccess: true,
    job: 'administrator: users and process profiles',
  },
  designer: {
    email: 'designer@brackenfold.example',
    displayName: 'Brackenfold Designer',
    role: 'member',
    processMaintainer: false,
    libraryAccess: true,
    job: 'analog designer: owns the demo project, sizes devices, requests reviews',
  },
  reviewer: {
    email: 'reviewer@brackenfold.example',
    displayName: 'Brackenfold Reviewer',
    role: 'member',
    processMaintainer: false,
    libraryAccess: true,
    job: 'senior designer: reviews and signs off',
  },
  viewer: {
    email: 'viewer@brackenfold.example',
    displayName: 'Brackenfold Viewer',
    role: 'member',
    processMaintainer: false,
    libraryAccess: false,
    job: 'layout engineer: reads sheets, downloads exports',
  },
} as const satisfies Record<string, DemoAccount>;
