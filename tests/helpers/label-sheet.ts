import type { Response } from 'superagent';
import type { SignedInAgent } from './test-app';

/** Collects a PDF answer as bytes; a JSON answer (an error) is parsed as usual. */
function bytesOrJson(res: Response, done: (err: Error | null, body: unknown) => void) {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => {
    const body = Buffer.concat(chunks);
    done(null, String(res.headers['content-type']).startsWith('application/json') ? JSON.parse(body.toString('utf8')) : body);
  });
}

/** POST /api/labels/sheet as `who`: the body is the PDF's bytes, or the error's JSON. */
export const postSheet = (who: SignedInAgent, body: unknown) =>
  who.agent.post('/api/labels/sheet').set('X-CSRF-Token', who.csrf).send(body as object).buffer(true).parse(bytesOrJson);
