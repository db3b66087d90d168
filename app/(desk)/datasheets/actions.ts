'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { issueDatasheetSchema } from '@/lib/datasheets/schema';

/** Issues the next revision of the sizing's datasheet; answers with its number and letter. */
export const issueDatasheetAction = defineAction(
  { permission: 'datasheet:issue', schema: issueDatasheetSchema, name: 'datasheet.issue' },
  async (input, user) => {
    const issued = await issueDatasheet(user, input);
    revalidatePath('/datasheets');
    revalidatePath(`/sizings/${input.sizingId}`);
    return { number: issued.number, revision: issued.revision, revisionId: issued.revisionId, sha256: issued.sha256 };
  },
);
