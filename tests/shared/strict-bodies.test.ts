import { describe, expect, it } from 'vitest';
import type { z } from 'zod';

/**
 * Every request body schema in shared/schemas refuses fields it does not know, at every depth: a
 * loose object anywhere would drop a mistyped field without a word (the server then names it).
 */
const modules = import.meta.glob<Record<string, unknown>>('../../shared/schemas/*.ts', { eager: true });

interface Def {
  type: string;
  shape?: Record<string, Walkable>;
  catchall?: Walkable;
  innerType?: Walkable;
  in?: Walkable;
  out?: Walkable;
  element?: Walkable;
  options?: Walkable[];
  left?: Walkable;
  right?: Walkable;
  getter?: () => Walkable;
}
interface Walkable {
  _zod: { def: Def };
}

/** The paths of the objects in a schema that let unknown keys through. */
function looseObjects(schema: Walkable, path = '(body)', seen = new Set<Walkable>()): string[] {
  if (seen.has(schema)) return [];
  seen.add(schema);
  const def = schema._zod.def;
  const inner = (s: Walkable | undefined, p = path) => (s ? looseObjects(s, p, seen) : []);
  switch (def.type) {
    case 'object': {
      const strict = def.catchall?._zod.def.type === 'never';
      return [...(strict ? [] : [path]), ...Object.entries(def.shape ?? {}).flatMap(([key, s]) => inner(s, `${path}.${key}`))];
    }
    case 'optional':
    case 'nullable':
    case 'default':
    case 'prefault':
    case 'readonly':
    case 'catch':
    case 'nonoptional':
      return inner(def.innerType);
    case 'pipe':
      return [...inner(def.in), ...inner(def.out)];
    case 'array':
      return inner(def.element, `${path}[]`);
    case 'union':
      return (def.options ?? []).flatMap((o) => inner(o));
    case 'intersection':
      // Each side of an intersection sees the other side's keys: neither can be strict, so refuse the shape.
      return [`${path} (an intersection)`];
    case 'lazy':
      return inner(def.getter?.());
    default:
      return [];
  }
}

const bodySchemas = Object.entries(modules).flatMap(([file, exports]) =>
  Object.entries(exports)
    .filter(([name]) => name.endsWith('BodySchema'))
    .map(([name, schema]) => ({ name: `${file.split('/').pop()}: ${name}`, schema: schema as z.ZodType & Walkable })),
);

describe('request body schemas', () => {
  it('finds the body schemas (the glob and the naming rule still work)', () => {
    expect(bodySchemas.length).toBeGreaterThan(30);
  });

  it.each(bodySchemas)('$name refuses unknown fields at every depth', ({ schema }) => {
    expect(looseObjects(schema)).toEqual([]);
  });

  it('the walker itself finds a loose object, a loose nested one and an intersection', async () => {
    const { z } = await import('zod');
    expect(looseObjects(z.object({ a: z.string() }) as unknown as Walkable)).toEqual(['(body)']);
    expect(looseObjects(z.strictObject({ a: z.array(z.object({ b: z.number() })).optional() }) as unknown as Walkable)).toEqual(['(body).a[]']);
    expect(looseObjects(z.strictObject({ a: z.strictObject({}).and(z.strictObject({})) }) as unknown as Walkable)).toEqual(['(body).a (an intersection)']);
    expect(looseObjects(z.strictObject({ a: z.strictObject({ b: z.number() }).refine(() => true) }) as unknown as Walkable)).toEqual([]);
  });
});
