import { apiRoute } from '@/lib/storage/http';
import { restoreRevisionRoute } from '@/lib/storage/showRoutes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = apiRoute<{ id: string; revision: string }>(restoreRevisionRoute);
