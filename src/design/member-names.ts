// What a member, or the anchorage, is called in words: 'pole', 'arm A1', 'anchor bolts', 'base plate'.
// 'pole', 'anchor-bolts' and 'base-plate' are reserved and cannot be arm ids (src/input/normalise.ts).
export function memberName(member: string): string {
  if (member === 'pole') return 'pole';
  if (member === 'anchor-bolts') return 'anchor bolts';
  if (member === 'base-plate') return 'base plate';
  return `arm ${member}`;
}
