import { buildClientWhenStale } from './client-build';

/** `npm start`: builds the client when it is stale, then serves. */
buildClientWhenStale();
await import('./index');
