import { MutationObserver, QueryClientProvider, type QueryClient, type QueryKey } from '@tanstack/react-query';
import { renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import { createQueryClient } from '@/app/provider';
import { useDraw } from '@/features/stock/api/bin-actions';
import { fakeFetch } from '../helpers/render';

/** Puts an answer in the cache for each key, fresh, as a screen that was just open leaves it. */
function cached(client: QueryClient, keys: Record<string, QueryKey>) {
  for (const key of Object.values(keys)) client.setQueryData(key, { shown: true });
}

const invalidated = (client: QueryClient, keys: Record<string, QueryKey>) =>
  Object.fromEntries(Object.entries(keys).map(([name, key]) => [name, client.getQueryState(key)?.isInvalidated ?? false]));

describe('a mutation refreshes what its meta declares', () => {
  const keys = {
    myTab: ['stock-money', 'tab', 'me'],
    otherTab: ['stock-money', 'tab', 12],
    bill: ['assemblies', 'estimate', 7],
    otherBill: ['assemblies', 'estimate', 8],
    tools: ['tools', 'list', {}],
    people: ['people', 'list'],
  } satisfies Record<string, QueryKey>;

  it('invalidates every query under each declared key and no other, once it succeeds', async () => {
    const client = createQueryClient();
    cached(client, keys);
    const observer = new MutationObserver(client, { mutationFn: () => Promise.resolve('done'), meta: { invalidates: [['stock-money', 'tab'], ['assemblies', 'estimate', 7]] } });
    await observer.mutate();
    expect(invalidated(client, keys)).toEqual({ myTab: true, otherTab: true, bill: true, otherBill: false, tools: false, people: false });
  });

  it('invalidates them after a refused change too: the refusal says the screen is out of date', async () => {
    const client = createQueryClient();
    cached(client, keys);
    const observer = new MutationObserver(client, { mutationFn: () => Promise.reject(new Error('refused')), meta: { invalidates: [['tools']] } });
    await expect(observer.mutate()).rejects.toThrow('refused');
    expect(invalidated(client, keys)).toEqual({ myTab: false, otherTab: false, bill: false, otherBill: false, tools: true, people: false });
  });

  it('invalidates nothing for a mutation that declares nothing', async () => {
    const client = createQueryClient();
    cached(client, keys);
    await new MutationObserver(client, { mutationFn: () => Promise.resolve('done') }).mutate();
    expect(Object.values(invalidated(client, keys))).not.toContain(true);
  });
});

describe('a draw', () => {
  it('refreshes the bin, the drawer’s tab, the assemblies’ bills, the alerts, the forecast and the day panels; not the tools or people', async () => {
    fakeFetch((call) =>
      call.path === '/api/auth/csrf' ? { status: 200, body: { token: 'csrf-token' } } : call.path === '/api/bins/BR-4-8/draw' ? { status: 201, body: { id: 1, quantity: -3, valueCents: -120 } } : undefined,
    );
    const client = createQueryClient();
    const shown = {
      bin: ['bins', 'detail', 'BR-4-8'],
      ledger: ['bins', 'ledger', 'BR-4-8', {}],
      restock: ['bins', 'restock'],
      myTab: ['stock-money', 'tab', 'me'],
      tabs: ['stock-money', 'tabs'],
      bill: ['assemblies', 'estimate', 7],
      alerts: ['alerts', 'list', 'active'],
      forecast: ['forecast', 'list'],
      today: ['today', 'member'],
      tools: ['tools', 'list', {}],
      people: ['people', 'list'],
    } satisfies Record<string, QueryKey>;
    cached(client, shown);
    const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
    const { result } = renderHook(() => useDraw(), { wrapper });
    await result.current.mutateAsync({ code: 'BR-4-8', body: { quantity: 3, assemblyId: 7 } });
    expect(invalidated(client, shown)).toEqual({
      bin: true,
      ledger: true,
      restock: true,
      myTab: true,
      tabs: true,
      bill: true,
      alerts: true,
      forecast: true,
      today: true,
      tools: false,
      people: false,
    });
  });
});
