import { signInRoute } from '@/lib/storage/sessionRoute';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = signInRoute;
