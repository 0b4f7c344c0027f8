import { apiRoute } from '@/lib/storage/http';
import { unbinShowRoute } from '@/lib/storage/showRoutes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = apiRoute<{ id: string }>(unbinShowRoute);
