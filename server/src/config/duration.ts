const SECONDS_PER_UNIT = { s: 1, m: 60, h: 3600, d: 86400 } as const;

/** Parses "90s", "15m", "8h", "7d" or a bare number of seconds; undefined when it is none of these. */
export function parseDurationSeconds(text: string): number | undefined {
  const match = /^(\d+)\s*([smhd]?)$/.exec(text.trim());
  if (!match) return undefined;
  const unit = (match[2] || 's') as keyof typeof SECONDS_PER_UNIT;
  const seconds = Number(match[1]) * SECONDS_PER_UNIT[unit];
  return seconds > 0 ? seconds : undefined;
}
