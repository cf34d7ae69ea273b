import type { Address } from 'postal-mime';

/** "Name <address>" (or the bare address) of a parsed From header; a group lists its members. */
export function formatAddress(address: Address): string {
  if (address.group) return `${address.name}: ${address.group.map(formatAddress).join(', ')};`;
  return address.name ? `${address.name} <${address.address}>` : address.address;
}
