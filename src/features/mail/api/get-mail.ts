import { queryOptions } from '@tanstack/react-query';
import type { MailList } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { mailKeys } from './keys';

/** Every message, for the lead's Sent mail; refreshed while the outbox works through it. */
export const mailQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.list(),
    queryFn: () => api.get<MailList>('/api/mail'),
    refetchInterval: 10_000,
  });

/** The signed-in person's own mail. */
export const myMailQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.mine(),
    queryFn: () => api.get<MailList>('/api/mail/mine'),
    refetchInterval: 10_000,
  });
