import { Notice } from '@/components/ui/notice';

/** Shown wherever sign-offs are given: the chapter decides, the plans and the maker's instructions govern. */
export function SignoffCaution() {
  return (
    <Notice tone="warn" title="Powered tools can hurt people">
      <ul className="list-disc space-y-1 pl-5">
        <li>Eye protection and hearing protection with every powered tool, every time.</li>
        <li>A member needs the tool's sign-off before first use: Gripline refuses the checkout until a chapter lead signs them off.</li>
        <li>
          The chapter decides who may sign people off and what each sign-off covers. The kit's plans and the tool maker's instructions
          govern how a tool is used; follow local codes and rules.
        </li>
      </ul>
    </Notice>
  );
}
