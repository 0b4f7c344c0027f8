import { apiRoute } from '@/lib/storage/http';
import { createShowRoute, listShowsRoute } from '@/lib/storage/showRoutes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = apiRoute(listShowsRoute);
export const POST = apiRoute(createShowRoute);
