// Next.js ambient types (CSS and image imports), committed because the generated next-env.d.ts is not.
/// <reference types="next" />
/// <reference types="next/image-types/global" />
