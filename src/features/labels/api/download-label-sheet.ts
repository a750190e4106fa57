import { useMutation } from '@tanstack/react-query';
import type { LabelSheetBody } from '@shared/schemas/labels';
import { postForBlob } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';
import { saveFile } from '../utils/save-file';

/** Asks the server for the label sheet PDF and hands it to the browser as a download. */
export function useDownloadLabelSheet() {
  return useMutation({
    mutationFn: async (body: LabelSheetBody) => {
      const pdf = await postForBlob('/api/labels/sheet', body);
      saveFile(pdf, `gripline-labels-${body.layoutId}.pdf`);
    },
    meta: { invalidates: shownOn.labelSheet },
  });
}
