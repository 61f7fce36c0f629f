/**
 * Refuses a batch of new register codes when two of them are the same or one is already recorded,
 * compared without regard to case as the code columns' collation compares them.
 */
export async function assertNewCodes(
  codes: string[],
  recorded: (codes: string[]) => Promise<{ code: string }[]>,
  taken: (code: string) => Error,
): Promise<void> {
  const seen = new Set<string>();
  for (const code of codes) {
    const key = code.toLowerCase();
    if (seen.has(key)) throw taken(code);
    seen.add(key);
  }
  const clash = (await recorded(codes))[0];
  if (clash) throw taken(clash.code);
}
