import type { PublicConfig, User } from '@channelwright/shared/schemas';

// Invented demo data: the people of the invented Brackenfold Semiconductor.
export const designer: User = {
  id: 'u-designer',
  email: 'designer@brackenfold.example',
  displayName: 'Ines Marlow',
  role: 'member',
  disabled: false,
  processMaintainer: false,
  createdAt: '2025-03-04T09:00:00.000Z',
};

export const admin: User = {
  id: 'u-admin',
  email: 'admin@brackenfold.example',
  displayName: 'Tobias Renn',
  role: 'admin',
  disabled: false,
  processMaintainer: true,
  createdAt: '2025-03-01T09:00:00.000Z',
};

export const reviewer: User = {
  id: 'u-reviewer',
  email: 'reviewer@brackenfold.example',
  displayName: 'Hollis Achebe',
  role: 'member',
  disabled: false,
  processMaintainer: false,
  createdAt: '2025-03-05T09:00:00.000Z',
};

export const demoConfig: PublicConfig = { signupEnabled: false, demo: true, version: '0.1.0-test' };
