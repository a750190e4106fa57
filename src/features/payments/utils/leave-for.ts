/** Sends the browser to the provider's hosted page: card numbers are typed there, never in Gripline. */
export function leaveFor(url: string): void {
  window.location.assign(url);
}
