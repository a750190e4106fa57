import { queryOptions } from '@tanstack/react-query';
import type { LabelPerson } from '@shared/schemas/labels';
import { api } from '@/lib/api-client';
import { labelKeys } from './keys';

/** The active people a badge can be printed for, and whether each has one now. */
export const labelPeopleQueryOptions = () =>
  queryOptions({
    queryKey: labelKeys.people(),
    queryFn: async () => (await api.get<{ data: LabelPerson[] }>('/api/labels/people')).data,
  });
