import L from 'leaflet';

// leaflet-geoman extends the global `L` when it loads; this module runs first so it finds one.
(globalThis as unknown as { L: typeof L }).L = L;
