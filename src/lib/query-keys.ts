import type { QueryClient, QueryKey } from '@tanstack/react-query';
import type { Role } from '@shared/roles';
import type { BinListQuery, LedgerQuery } from '@shared/schemas/bins';
import type { AssemblyStatus } from '@shared/schemas/builds';
import type { PaymentsQuery } from '@shared/schemas/payments';
import type { ToolListQuery } from '@shared/schemas/tools';

/**
 * Every query key of the app, one factory per family. A screen of one feature often shows another
 * feature's data (a draw's bin on the assembly's bill, the tab on home), and features never import
 * each other: their keys live here, and each feature's `api/keys.ts` only re-exports its own.
 */

export const authKeys = {
  all: ['auth'] as const,
  me: () => ['auth', 'me'] as const,
  invitation: (token: string) => ['auth', 'invitation', token] as const,
};

export const toolKeys = {
  all: ['tools'] as const,
  list: (filters: Partial<ToolListQuery>) => ['tools', 'list', filters] as const,
  detail: (code: string) => ['tools', 'detail', code] as const,
  events: (code: string) => ['tools', 'events', code] as const,
  myLoans: () => ['tools', 'loans', 'mine'] as const,
  openLoans: () => ['tools', 'loans', 'open'] as const,
  loanStats: () => ['tools', 'loans', 'stats'] as const,
};

export const binKeys = {
  all: ['bins'] as const,
  lists: () => ['bins', 'list'] as const,
  list: (filters: Partial<BinListQuery>) => ['bins', 'list', filters] as const,
  detail: (code: string) => ['bins', 'detail', code] as const,
  reorder: (code: string) => ['bins', 'reorder', code] as const,
  ledger: (code: string, range: Partial<LedgerQuery> = {}) => ['bins', 'ledger', code, range] as const,
  restock: () => ['bins', 'restock'] as const,
};

export const forecastKeys = {
  all: ['forecast'] as const,
  list: () => ['forecast', 'list'] as const,
};

export const alertKeys = {
  all: ['alerts'] as const,
  lists: () => ['alerts', 'list'] as const,
  list: (state: string) => ['alerts', 'list', state] as const,
  purchaseList: () => ['alerts', 'purchase-list'] as const,
};

/** The chapter's planning settings and the waste measured on finished assemblies. */
export const planningKeys = {
  settings: () => ['planning-settings'] as const,
  waste: () => ['planning-settings', 'waste'] as const,
};

export interface BuildListFilters {
  /** Quartermasters and leads may see every member's builds. */
  all?: boolean;
}

export interface AssemblyListFilters {
  mine?: boolean;
  status?: AssemblyStatus;
}

export const buildKeys = {
  all: ['builds'] as const,
  list: (filters: BuildListFilters) => ['builds', 'list', filters] as const,
  detail: (id: number) => ['builds', 'detail', id] as const,
};

export const assemblyKeys = {
  all: ['assemblies'] as const,
  list: (filters: AssemblyListFilters) => ['assemblies', 'list', filters] as const,
  detail: (id: number) => ['assemblies', 'detail', id] as const,
  /** The estimate with its bill: what to draw, what is drawn so far, the bins' on hand, the crib kit. */
  estimate: (id: number) => ['assemblies', 'estimate', id] as const,
};

export const preferenceKeys = {
  all: ['preferences'] as const,
};

export const stockMoneyKeys = {
  all: ['stock-money'] as const,
  tabs: () => ['stock-money', 'tabs'] as const,
  /** Every single tab, whoever it belongs to. */
  anyTab: () => ['stock-money', 'tab'] as const,
  /** One person's tab; 'me' is the signed-in person's own. */
  tab: (who: number | 'me') => ['stock-money', 'tab', who] as const,
  spend: (months: number) => ['stock-money', 'spend', months] as const,
  /** Every list of payments, whatever its filters. */
  anyPayments: () => ['stock-money', 'payments'] as const,
  /** Everyone's payments, cash and online, for one set of filters. */
  payments: (query: PaymentsQuery) => ['stock-money', 'payments', query] as const,
  /** Online checkouts whose completion was refused: the provider's amount differed from the one asked. */
  refusedCheckouts: () => ['stock-money', 'refused-checkouts'] as const,
};

export const paymentKeys = {
  all: ['payments'] as const,
  settings: () => ['payments', 'settings'] as const,
  checkout: (sessionId: string) => ['payments', 'checkout', sessionId] as const,
};

export const signoffKeys = {
  all: ['signoffs'] as const,
  list: () => ['signoffs', 'list'] as const,
  mine: () => ['signoffs', 'mine'] as const,
  requests: () => ['signoffs', 'requests'] as const,
  myRequests: () => ['signoffs', 'requests', 'mine'] as const,
};

export const cribSettingsKeys = {
  all: ['crib-settings'] as const,
};

export const serviceKeys = {
  all: ['service'] as const,
  due: () => ['service', 'due'] as const,
};

export const overdueKeys = {
  all: ['overdue'] as const,
  list: () => ['overdue', 'list'] as const,
};

export const peopleKeys = {
  all: ['people'] as const,
  list: () => ['people', 'list'] as const,
  invitations: () => ['people', 'invitations'] as const,
};

export const mailKeys = {
  all: ['mail'] as const,
  list: () => ['mail', 'list'] as const,
  mine: () => ['mail', 'mine'] as const,
};

export const labelKeys = {
  all: ['labels'] as const,
  layouts: () => ['labels', 'layouts'] as const,
  tools: () => ['labels', 'tools'] as const,
  bins: () => ['labels', 'bins'] as const,
  people: () => ['labels', 'people'] as const,
};

/** The enrolled stations (quartermaster and lead), and the person signed in at this station. */
export const stationKeys = {
  all: ['stations'] as const,
  list: () => ['stations', 'list'] as const,
  session: () => ['stations', 'session'] as const,
};

/** Home's "today" answers, one per role. Home refetches them whenever it is opened. */
export const todayKeys = {
  all: ['today'] as const,
  role: (role: Role) => ['today', role] as const,
};

/**
 * What each kind of change shows on. A mutation names the ones its change is in `meta.invalidates`
 * (`meta: { invalidates: shownOn.stockMovement }`); the app's QueryClient (app/provider.tsx)
 * refreshes them once it settles, so a screen of any feature showing the change is never stale.
 */
export const shownOn = {
  /**
   * A draw, return, receipt, count, move, write-off or reversal: the bins, their ledgers and Restock;
   * the alerts and the forecast (what to order now); the tabs, spend and payments; the assemblies'
   * bills (drawn so far, on hand) and the waste measured on them; the day panels.
   */
  stockMovement: [binKeys.all, alertKeys.all, forecastKeys.all, stockMoneyKeys.all, assemblyKeys.all, planningKeys.waste(), todayKeys.all],
  /** A bin made, edited or imported: its figures, what to order, the bills that name it, its label. */
  binSpec: [binKeys.all, alertKeys.all, forecastKeys.all, assemblyKeys.all, labelKeys.bins(), todayKeys.all],
  /** An alert ordered, closed, dismissed or raised: on order and to order on the bins, the forecast, the day panels. */
  alertState: [binKeys.all, alertKeys.all, forecastKeys.all, todayKeys.all],
  /** An assembly planned, changed or deleted: its build, the lists, its estimate, and the planned need behind what to order. */
  plans: [buildKeys.all, assemblyKeys.all, binKeys.all, alertKeys.all, forecastKeys.all, todayKeys.all],
  builds: [buildKeys.all],
  /** Waste, service level or costs changed: the forecast and what to order, and the waste on every estimate. */
  planningSettings: [planningKeys.waste(), forecastKeys.all, alertKeys.all, binKeys.all, assemblyKeys.all, todayKeys.all],
  /**
   * A checkout, return, hold, status change or accessory found: the tools, loans and holds; the
   * Service and Overdue lists; the crib kits on the assemblies; the day panels.
   */
  toolState: [toolKeys.all, serviceKeys.all, overdueKeys.all, assemblyKeys.all, todayKeys.all],
  /** A tool made or edited (photos too): the tools, its label, its service interval, the crib kits. */
  toolSpec: [toolKeys.all, labelKeys.tools(), serviceKeys.all, assemblyKeys.all],
  /** A payment or refund: the tabs, the payments list, the day panels, the receipt in the mail. */
  payment: [stockMoneyKeys.all, todayKeys.all, mailKeys.all],
  /** A sign-off defined, granted or revoked, or a request asked or declined: the lists and the lead's day. */
  signoffs: [signoffKeys.all, todayKeys.all],
  /** A reminder sent: the Overdue list, the lead's day, the sent mail. */
  reminder: [overdueKeys.all, todayKeys.all, mailKeys.all],
  /** A person's role or standing changed: the people list, and their loans and holds if they lost them. */
  person: [peopleKeys.all, toolKeys.all, todayKeys.all],
  /** A label sheet printed: badges on it were issued anew, so who has a badge changed. */
  labelSheet: [peopleKeys.all, labelKeys.people()],
  /** An invitation sent or withdrawn: the pending list and its mail. */
  invitations: [peopleKeys.invitations(), mailKeys.all],
  mail: [mailKeys.all],
  /** The chapter's time zone or hold time: every day the server counted (due, late, by month) and the holds' ends. */
  /** A station enrolled or revoked: the Stations list. */
  stations: [stationKeys.list()],
  chapterSettings: [toolKeys.all, overdueKeys.all, serviceKeys.all, stockMoneyKeys.all, todayKeys.all],
} satisfies Record<string, readonly QueryKey[]>;

declare module '@tanstack/react-query' {
  interface Register {
    mutationMeta: {
      /** Keys (usually a `shownOn` entry) whose queries show what this mutation changes. */
      invalidates?: readonly QueryKey[];
    };
  }
}

/** Marks every query under each key stale and refetches the ones on screen. */
export function refreshShown(queryClient: QueryClient, keys: readonly QueryKey[]): Promise<unknown> {
  return Promise.all(keys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
}
