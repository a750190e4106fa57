import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';

/**
 * Type a code, or let a USB scanner type it: scanners send the code followed by Enter, which
 * submits this form when the field has focus (it does on the Scan screen).
 */
export function CodeEntry({ onCode, autoFocus = false }: { onCode: (code: string) => void; autoFocus?: boolean }) {
  const [value, setValue] = useState('');
  return (
    <form
      className="flex items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        const code = value.trim().toUpperCase();
        if (code) onCode(code);
        setValue('');
      }}
    >
      <div className="flex-1">
        <TextField
          label="Or type the code on the label"
          value={value}
          onChange={(e) => setValue(e.target.value)}
          autoFocus={autoFocus}
          autoCapitalize="characters"
          autoComplete="off"
          spellCheck={false}
          placeholder="T-0042 or B-0107"
          className="font-mono"
        />
      </div>
      <Button type="submit">Open</Button>
    </form>
  );
}
