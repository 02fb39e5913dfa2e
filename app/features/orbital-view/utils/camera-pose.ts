/**
 * Where the camera of a 3D figure sits and how much it shows, from the spec's view (azimuth and
 * elevation in the physics frame, zoom, projection) and the radius of what is drawn. Shared by
 * the viewer and the print page, so both frame a figure identically.
 *
 * Conventions (Lobewright's own): azimuth is measured in the physics xy plane from +x toward +y,
 * elevation up from that plane toward +z; the camera looks at the nucleus with physics +z up on
 * screen. Azimuth −90°, elevation 0° looks along +y (x to the right, z up), as in the xz slice.
 * Straight down or up, screen-up is the direction away from the camera's azimuth.
 * Framing: at zoom 1 the sphere of the figure's radius, plus a margin, fits the shorter side.
 */
import { physicsToThree, threeToPhysics, type Vec3 } from '../../../../shared/physics/coordinates';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';

export type ViewSettings = FigureSpec['view'];

/** Room around the figure's sphere at zoom 1 (fraction of its radius). */
export const FRAME_MARGIN = 1.3;
/** Vertical field of view of the perspective camera, degrees. */
export const PERSPECTIVE_FOV = 30;
/** Elevations this close to ±90° count as straight down or up. */
const POLE_DEGREES = 1e-6;

export interface CameraPose {
  /** Camera position, three.js frame (bohr). */
  readonly position: Vec3;
  /** Screen-up direction, three.js frame. */
  readonly up: Vec3;
  /** Orthographic: pixels per bohr (three's camera.zoom with a pixel-sized frustum). */
  readonly pixelsPerBohr: number;
  /** Perspective: distance from the nucleus, bohr. */
  readonly distance: number;
  readonly near: number;
  readonly far: number;
}

const radians = (degrees: number): number => (degrees * Math.PI) / 180;

export function cameraPose(
  view: ViewSettings,
  radius: number,
  widthPx: number,
  heightPx: number,
): CameraPose {
  const az = radians(view.azimuthDeg);
  const el = radians(view.elevationDeg);
  const fitted = Math.max(radius, 1e-6) * FRAME_MARGIN;
  const shorter = Math.min(widthPx, heightPx);
  const halfFov = radians(PERSPECTIVE_FOV / 2);
  const perspectiveDistance =
    fitted / (Math.tan(halfFov) * Math.min(1, widthPx / heightPx)) / view.zoom;
  const distance = view.projection === 'perspective' ? perspectiveDistance : 4 * fitted;
  const direction = {
    x: Math.cos(el) * Math.cos(az),
    y: Math.cos(el) * Math.sin(az),
    z: Math.sin(el),
  };
  let upPhysics: Vec3 = { x: 0, y: 0, z: 1 };
  if (Math.abs(Math.abs(view.elevationDeg) - 90) < POLE_DEGREES) {
    const s = view.elevationDeg > 0 ? -1 : 1;
    upPhysics = { x: s * Math.cos(az), y: s * Math.sin(az), z: 0 };
  }
  return {
    position: physicsToThree(
      direction.x * distance,
      direction.y * distance,
      direction.z * distance,
    ),
    up: physicsToThree(upPhysics.x, upPhysics.y, upPhysics.z),
    pixelsPerBohr: (shorter / 2 / fitted) * view.zoom,
    distance,
    near: Math.max(distance - 3 * fitted, distance * 1e-3),
    far: distance + 3 * fitted,
  };
}

/** The view a camera position (three.js frame) and zoom correspond to: the inverse of cameraPose. */
export function viewFromCamera(
  position: Vec3,
  zoom: number,
  base: ViewSettings,
  radius: number,
  widthPx: number,
  heightPx: number,
): ViewSettings {
  const p = threeToPhysics(position.x, position.y, position.z);
  const length = Math.hypot(p.x, p.y, p.z);
  const azimuthDeg = round((Math.atan2(p.y, p.x) * 180) / Math.PI, 2);
  const elevationDeg = round(
    (Math.asin(Math.max(-1, Math.min(1, p.z / length))) * 180) / Math.PI,
    2,
  );
  const atZoomOne = cameraPose({ ...base, zoom: 1 }, radius, widthPx, heightPx);
  const relative =
    base.projection === 'perspective'
      ? atZoomOne.distance / length
      : zoom / atZoomOne.pixelsPerBohr;
  return {
    ...base,
    azimuthDeg,
    elevationDeg,
    zoom: round(Math.min(10, Math.max(0.1, relative)), 3),
  };
}

function round(value: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(value * f) / f + 0;
}
