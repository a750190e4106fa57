export const ROLES = ['member', 'quartermaster', 'lead'] as const;
export type Role = (typeof ROLES)[number];

/** The rank of each role: a lead can do everything a quartermaster can, who can do everything a member can. */
const RANK: Record<Role, number> = { member: 0, quartermaster: 1, lead: 2 };

export function hasRole(actual: Role, needed: Role): boolean {
  return RANK[actual] >= RANK[needed];
}

export const ROLE_LABELS: Record<Role, string> = {
  member: 'Member',
  quartermaster: 'Quartermaster',
  lead: 'Chapter lead',
};

/** What each role may do, in the words shown on the home page and the People screen. */
export const ROLE_ABILITIES: Record<Role, readonly string[]> = {
  member: [
    'Sign in and keep your own password',
    'Borrow and return crib tools by scanning their labels',
    'Join the queue for a tool someone else has',
    'Draw fasteners for the assembly you are building (when stock opens)',
  ],
  quartermaster: [
    'Everything a member can do',
    'Add, edit, service and retire crib tools, and print their labels',
    'See who holds what',
    'Keep the bins stocked and count them (when stock opens)',
  ],
  lead: [
    'Everything a quartermaster can do',
    'Invite people by e-mail, change their role, deactivate them',
    'Read the mail Gripline has sent',
    'Decide who may use which powered tools (sign-offs)',
    'See what is overdue and send reminders',
  ],
};
