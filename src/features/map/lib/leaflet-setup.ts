// Import order matters: Leaflet, then the global geoman extends, then geoman itself.
import 'leaflet/dist/leaflet.css';
import './leaflet-global';
import '@geoman-io/leaflet-geoman-free';
import '@geoman-io/leaflet-geoman-free/dist/leaflet-geoman.css';
