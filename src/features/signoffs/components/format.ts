export { formatDate as formatGrantDate } from '@/lib/format';

export const toolCountWords = (n: number) => (n === 0 ? 'No tool needs it yet' : n === 1 ? 'Needed by 1 tool' : `Needed by ${n} tools`);
