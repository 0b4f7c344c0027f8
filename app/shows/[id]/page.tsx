import Link from 'next/link';
import { notFound } from 'next/navigation';
import { PlotEditor } from '@/components/editor/PlotEditor';
import { SignIn } from '@/components/shows/SignIn';
import { getServerStore } from '@/lib/storage/serverStore';
import { SHOW_ID_PATTERN } from '@/lib/storage/showStore';
import { pageHasAccess } from '../../pageAccess';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** The editor for one stored show, at its newest revision; edits are autosaved. */
export default async function ShowPage({ params }: { params: Promise<{ id: string }> }) {
  if (!(await pageHasAccess())) return <SignIn failed={false} />;
  const { id } = await params;
  if (!SHOW_ID_PATTERN.test(id)) notFound();
  const show = await (await getServerStore()).getShow(id);
  if (!show) notFound();
  if (show.deletedAt !== null) {
    return (
      <main className="app-error">
        <h1>Throwline</h1>
        <p>
          {show.name} is in the bin. Restore it from the <Link href="/">start page</Link> to edit it.
        </p>
      </main>
    );
  }
  return (
    <PlotEditor
      key={`${show.id}:${show.revision}`}
      initialDocument={show.document}
      show={{ id: show.id, revision: show.revision }}
    />
  );
}
