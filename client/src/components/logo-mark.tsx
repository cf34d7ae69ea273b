interface LogoMarkProps {
  size?: number;
}

/**
 * Channelwright's mark, a transistor in cross-section: the gate over its thin oxide, the copper
 * channel at the surface joining the source and drain wells, and their two contacts.
 * Drawn for this product; the background follows the active scheme through Mantine's variables.
 */
export function LogoMark({ size = 28 }: LogoMarkProps) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" role="img" aria-label="Channelwright logo">
      <rect width="32" height="32" rx="8" fill="var(--mantine-primary-color-filled)" />
      <rect x="11" y="7" width="10" height="4.5" rx="1.2" fill="#ffffff" />
      <rect x="11" y="12.6" width="10" height="1.1" rx="0.5" fill="#ffffff" opacity="0.55" />
      <rect x="10.5" y="15" width="11" height="2.4" rx="0.6" fill="var(--mantine-color-oxide-4)" />
      <rect x="7" y="8" width="2.2" height="7.5" rx="1" fill="#ffffff" opacity="0.9" />
      <rect x="22.8" y="8" width="2.2" height="7.5" rx="1" fill="#ffffff" opacity="0.9" />
      <path d="M4 15h8.5v5a4.25 4.25 0 0 1-8.5 0z" fill="#ffffff" />
      <path d="M19.5 15H28v5a4.25 4.25 0 0 1-8.5 0z" fill="#ffffff" />
    </svg>
  );
}
