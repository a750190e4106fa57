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
    'Plan your assemblies: the fasteners they take and the crib tools to hold for them',
    'Draw fasteners from the bins for your assembly, and return what you did not use',
    'Read your tab: what you drew, what it cost, what you have paid',
  ],
  quartermaster: [
    'Everything a member can do',
    'Add, edit, service and retire crib tools, and print their labels',
    'See who holds what',
    'Add bins, count them, receive deliveries and write off what is spoiled',
    'Act on reorder alerts and the purchase list, and see the stock forecast',
    'Read members’ tabs and record their payments',
  ],
  lead: [
    'Everything a quartermaster can do',
    'Invite people by e-mail, change their role, deactivate them',
    'Read the mail Gripline has sent',
    'Decide who may use which powered tools (sign-offs)',
    'See what is overdue and send reminders',
    'See the chapter’s consumable spend by month and kind',
  ],
};
