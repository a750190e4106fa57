/** The quartermaster's part of home: what needs them today. */
export function QuartermasterToday() {
  return null;
}
