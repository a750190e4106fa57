const dateFormat = new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric' });

export const formatGrantDate = (iso: string) => dateFormat.format(new Date(iso));

export const toolCountWords = (n: number) => (n === 0 ? 'No tool needs it yet' : n === 1 ? 'Needed by 1 tool' : `Needed by ${n} tools`);
