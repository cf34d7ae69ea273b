/**
 * λ at length L: lambda·lRef/L when the process gives lRef (λ ∝ 1/L, common practice, no source),
 * else lambda itself (SPICE level 1 has no length scaling).
 */
export function lambdaAtLength(params: { readonly lambda: number; readonly lRef?: number }, l: number): number {
  return params.lRef === undefined ? params.lambda : (params.lambda * params.lRef) / l;
}
