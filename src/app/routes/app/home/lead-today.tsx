/** The lead's part of home: what needs them today. */
export function LeadToday() {
  return null;
}
