import { notFound } from 'next/navigation';
import { PrintView } from '@/components/paperwork/PrintView';
import { readPaperSize, readPrintSheet } from '@/components/paperwork/printOptions';
import { SignIn } from '@/components/shows/SignIn';
import { getServerStore } from '@/lib/storage/serverStore';
import { SHOW_ID_PATTERN } from '@/lib/storage/showStore';
import { pageHasAccess } from '../../../pageAccess';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** The print view of a show's newest saved revision: ?sheet=plot|schedule|focus|all&paper=a4|letter. */
export default async function PrintPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  if (!(await pageHasAccess())) return <SignIn failed={false} />;
  const { id } = await params;
  const query = await searchParams;
  if (!SHOW_ID_PATTERN.test(id)) notFound();
  const show = await (await getServerStore()).getShow(id);
  if (!show) notFound();
  return (
    <PrintView
      document={show.document}
      revision={show.revision}
      sheet={readPrintSheet(query.sheet)}
      paper={readPaperSize(query.paper)}
      printedAt={new Date().toISOString()}
      editorHref={`/shows/${show.id}`}
    />
  );
}
