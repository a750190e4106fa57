/** The member's part of home: what needs them today. */
export function MemberToday() {
  return null;
}
