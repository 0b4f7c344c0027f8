import { notFound } from 'next/navigation';
import { RevisionList } from '@/components/shows/RevisionList';
import { SignIn } from '@/components/shows/SignIn';
import { getServerStore } from '@/lib/storage/serverStore';
import { SHOW_ID_PATTERN } from '@/lib/storage/showStore';
import { pageHasAccess } from '../../../pageAccess';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** Every revision of a show, newest first. */
export default async function HistoryPage({ params }: { params: Promise<{ id: string }> }) {
  if (!(await pageHasAccess())) return <SignIn failed={false} />;
  const { id } = await params;
  if (!SHOW_ID_PATTERN.test(id)) notFound();
  const store = await getServerStore();
  const [show, revisions] = await Promise.all([store.getShow(id), store.listRevisions(id)]);
  if (!show || !revisions) notFound();
  const { document: _document, ...summary } = show;
  return <RevisionList show={summary} revisions={revisions} />;
}
