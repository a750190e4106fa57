import { useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { LinkButton } from '@/components/ui/link-button';
import { Notice } from '@/components/ui/notice';
import { PageHeading } from '@/components/ui/page';
import { CodeEntry } from '@/features/tools/components/code-entry';
import { labelPath, notALabelWords } from '@/features/tools/utils/label-path';

/**
 * A tool or bin page whose code nobody has (a mistyped code, a label from another crib): says so in
 * the server's words and offers the two ways on, scanning again or typing the code.
 * It shows inside the app shell, whose <main> it sits in.
 */
export function UnknownCode({ message }: { message: string }) {
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string>();
  const open = (raw: string) => {
    const path = labelPath(raw);
    setProblem(path ? undefined : notALabelWords(raw));
    if (path) void navigate(path);
  };
  return (
    <div className="mx-auto flex max-w-md flex-col gap-4 px-4 py-10">
      <PageHeading title="Code not found" />
      <p role="alert">{message}</p>
      <LinkButton to="/scan" className="self-start">
        Scan again
      </LinkButton>
      {problem && <Notice tone="warn">{problem}</Notice>}
      <CodeEntry onCode={open} />
      <Link to="/" className="inline-flex min-h-12 items-center self-start font-semibold underline underline-offset-4">
        Go to home
      </Link>
    </div>
  );
}
