/// <reference types="vite/client" />
/// <reference types="vite-plugin-pwa/client" />

/** The build this client came from (vite.config.ts). */
declare const __APP_BUILD__: string;
