import L from 'leaflet';
import { colors } from '@/lib/theme';
import { shapePath } from '../lib/shape-path';
import type { VerdictStyle } from '../lib/verdict-style';

export interface TreeMarkerLook {
  style: VerdictStyle;
  radius: number;
  showLetter: boolean;
  selected: boolean;
}

/** The parts of Leaflet's canvas renderer and circle marker this marker draws through. */
interface CanvasInternals {
  _ctx?: CanvasRenderingContext2D;
  _drawing?: boolean;
}
interface MarkerInternals {
  _point: L.Point;
  _radius: number;
  _renderer: CanvasInternals;
  _pxBounds: L.Bounds;
  _empty(): boolean;
  _clickTolerance(): number;
}

const HALO = 6;

/**
 * A canvas circle marker that draws its verdict's shape (and letter, close up) instead of a
 * plain dot. Hit-testing stays Leaflet's: a circle of the marker's radius.
 */
export class TreeMarker extends L.CircleMarker {
  look: TreeMarkerLook;

  constructor(latlng: L.LatLngExpression, look: TreeMarkerLook, options: L.CircleMarkerOptions) {
    super(latlng, { ...options, radius: look.radius });
    this.look = look;
  }

  setLook(look: TreeMarkerLook) {
    this.look = look;
    if (this.getRadius() !== look.radius) this.setRadius(look.radius);
    else this.redraw();
  }

  // Leaflet calls these two while it lays out and paints the canvas.
  _updateBounds() {
    const self = this as unknown as MarkerInternals;
    const r = self._radius * 1.4 + HALO + 2 + self._clickTolerance();
    self._pxBounds = new L.Bounds(self._point.subtract([r, r]), self._point.add([r, r]));
  }

  _updatePath() {
    const self = this as unknown as MarkerInternals;
    const ctx = self._renderer._ctx;
    if (!ctx || !self._renderer._drawing || self._empty()) return;
    const { x, y } = self._point;
    const { style, showLetter, selected } = this.look;
    const r = Math.max(self._radius, 1);

    ctx.save();
    ctx.globalAlpha = 1;
    ctx.setLineDash([]);
    if (selected) {
      ctx.beginPath();
      ctx.arc(x, y, r * 1.4 + HALO, 0, Math.PI * 2);
      ctx.lineWidth = 5;
      ctx.strokeStyle = colors.ink;
      ctx.stroke();
      ctx.lineWidth = 2.5;
      ctx.strokeStyle = colors.sap;
      ctx.stroke();
    }
    const path = new Path2D(shapePath(style.shape, x, y, r));
    ctx.fillStyle = style.solid ? style.color : colors.paper;
    ctx.fill(path);
    ctx.lineWidth = style.solid ? 1 : Math.max(2, r / 3.5);
    ctx.strokeStyle = style.solid ? colors.ink : style.color;
    ctx.stroke(path);
    if (showLetter) {
      ctx.fillStyle = style.solid ? style.letterColor : colors.ink;
      ctx.font = `700 ${Math.round(r * 1.1)}px "Merriweather Sans", system-ui, sans-serif`;
      ctx.textAlign = 'center';
      ctx.textBaseline = 'middle';
      ctx.fillText(style.letter, x, y + (style.shape === 'triangle' ? r * 0.2 : 0.5));
    }
    ctx.restore();
  }
}
