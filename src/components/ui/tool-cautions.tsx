import { TOOL_CAUTION_CLOSING, toolCautions } from '@shared/safety/tool-cautions';
import type { ToolCategory } from '@shared/tools/categories';
import { Notice } from './notice';

/** The cautions for tools of these categories, each once, in the caution style; nothing when none applies. */
export function ToolCautions({ categories }: { categories: Iterable<ToolCategory> }) {
  const cautions = toolCautions(categories);
  if (cautions.length === 0) return null;
  return (
    <Notice tone="warn" title="Caution: tools that can hurt">
      <ul aria-label="Cautions" className="list-disc space-y-1 pl-5">
        {cautions.map((c) => (
          <li key={c.key}>
            <strong>{c.title}:</strong> {c.text}
          </li>
        ))}
      </ul>
      <p className="mt-2">{TOOL_CAUTION_CLOSING}</p>
    </Notice>
  );
}
