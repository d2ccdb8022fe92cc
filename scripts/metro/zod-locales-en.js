// What the web bundle gets for zod's `locales` namespace: English only. zod registers
// English itself (v4/classic/schemas.js); every message the app shows is its own, so the
// other 60-odd translations zod ships (about 250 KB before compression) never load.
export { default as en } from 'zod/v4/locales/en.js';
