import { batchTemplateCsv } from '@/lib/batch/template';

export const runtime = 'nodejs';

/** The batch template: public, so a prospect can see what a batch needs. */
export function GET() {
  return new Response(batchTemplateCsv(), {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': 'attachment; filename="dutywise-batch-template.csv"',
    },
  });
}
