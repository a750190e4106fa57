import { data } from 'react-router';

/** A path id as a number, or a 404 before any request. */
export function idFrom(params: { id?: string }): number {
  const id = Number(params.id);
  if (!Number.isInteger(id) || id < 1) throw data({ message: 'There is no such build or assembly.' }, { status: 404 });
  return id;
}
