import { Canvas, useThree } from '@react-three/fiber';
import { useEffect, useMemo } from 'react';
import {
  BufferGeometry,
  DataTexture,
  DoubleSide,
  Float32BufferAttribute,
  Matrix4,
  NearestFilter,
  RGBAFormat,
  SRGBColorSpace,
  type BufferGeometry as Geometry,
} from 'three';
import { readMouldFile } from '@gelpoint/mesh';
import { OrbitControls } from 'three-stdlib';
import type { ForecastHeat } from '../../../components/heat/heat-colours';
import type { CavityReport, DepthMap, MoldFileUnits, UpAxis } from '../types';
import { mmPerFileUnit } from '../utils/file-units';
import { heatSurface, mapPlane } from '../utils/heat-surface';
import { resinOutlines } from '../utils/resin-outline';
import { upAxisTurn } from '../utils/up-axis-turn';

export interface MoldSceneProps {
  /** The mould file as uploaded: STL, 3MF or OBJ. */
  file: ArrayBuffer;
  upAxis: UpAxis;
  units: MoldFileUnits;
  bboxMm: CavityReport['bboxMm'];
  /** Absolute level in the report frame. */
  levelMm: number;
  /** Every layer boundary from the cavity floor up to the fill level (absolute); a line is drawn at each layer's top. */
  layerLevelsMm: readonly number[];
  /** Where resin stands at the level; without it the surface spans the bounding box and no layer line is drawn. */
  footprint: DepthMap | undefined;
  /** The level the footprint's depths were measured at (it may trail the slider by a moment). */
  footprintLevelMm: number | undefined;
  /** The forecast peak per column: when given, the resin surface is coloured by it instead of plain resin. */
  heat?: ForecastHeat | undefined;
  describedBy: string;
}

const woodColour = '#a98560';
const resinColour = '#d69824';
const lineColour = '#3e2a17';
const paperColour = '#fbf8f3';

/**
 * The file's triangles in the report's frame, read by the engine's own reader (so a 3MF's
 * transforms and an STL's quirks come out as in the analysis), with the same turn and scale.
 */
function moldGeometry(file: ArrayBuffer, upAxis: UpAxis, units: MoldFileUnits): Geometry {
  const read = readMouldFile(new Uint8Array(file));
  // The file was analysed already, so it reads; the error boundary shows anything else.
  if (!read.ok) throw new Error(read.error.message);
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new Float32BufferAttribute(read.value.soup.positions, 3));
  const m = upAxisTurn(upAxis);
  const s = mmPerFileUnit(units);
  geometry.applyMatrix4(new Matrix4().set(m[0] * s, m[1] * s, m[2] * s, 0, m[3] * s, m[4] * s, m[5] * s, 0, m[6] * s, m[7] * s, m[8] * s, 0, 0, 0, 0, 1));
  // Many exporters write zero normals; faces lit from their own corners always read right.
  geometry.computeVertexNormals();
  return geometry;
}

/** On the cavity at each layer's top: the outline of the resin surface there, where it meets the wood. */
function layerLineGeometry(mold: Geometry, topsMm: readonly number[], footprint: DepthMap | undefined, footprintLevelMm: number | undefined): Geometry {
  const positions = mold.getAttribute('position').array;
  const points = footprint && footprintLevelMm !== undefined ? resinOutlines(positions, topsMm, { map: footprint, fillLevelMm: footprintLevelMm }) : [];
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new Float32BufferAttribute(points, 3));
  return geometry;
}

const resinRgb = [214, 152, 36] as const;

// Row iy of a map is row iy of the texture from the bottom, the plane's −y edge: the same way round.
function columnTexture(pixels: Uint8Array, nx: number, ny: number): DataTexture {
  const texture = new DataTexture(pixels, nx, ny, RGBAFormat);
  texture.magFilter = NearestFilter;
  texture.minFilter = NearestFilter;
  texture.needsUpdate = true;
  return texture;
}

/** The wet columns of the depth map as an opaque-or-clear texture, so the resin surface shows only where resin is. */
function footprintTexture(map: DepthMap): DataTexture {
  const pixels = new Uint8Array(map.nx * map.ny * 4);
  map.depthsMm.forEach((depthMm, i) => {
    if (!(depthMm > 0)) return;
    pixels.set([...resinRgb, 255], i * 4);
  });
  return columnTexture(pixels, map.nx, map.ny);
}

interface ResinSurface {
  centre: [number, number];
  size: [number, number];
  texture: DataTexture | null;
  /** With a forecast: the colours are the heat scale's own, and the hottest column is marked. */
  heat: { hottestMm: [number, number]; markerMm: number } | null;
}

function resinSurface(bboxMm: CavityReport['bboxMm'], footprint: DepthMap | undefined, heat: ForecastHeat | undefined): ResinSurface {
  if (heat) {
    const painted = heatSurface(heat);
    const texture = columnTexture(painted.pixels, painted.nx, painted.ny);
    // The scale's colours are sRGB, as the top-down map and the legend draw them; unlit, they come out the same.
    texture.colorSpace = SRGBColorSpace;
    const markerMm = Math.max(painted.sizeMm[0], painted.sizeMm[1]) / 60;
    return { centre: painted.centreMm, size: painted.sizeMm, texture, heat: { hottestMm: painted.hottestMm, markerMm } };
  }
  if (!footprint) {
    const size: [number, number] = [(bboxMm.max[0] - bboxMm.min[0]) * 1.02, (bboxMm.max[1] - bboxMm.min[1]) * 1.02];
    return { centre: [(bboxMm.max[0] + bboxMm.min[0]) / 2, (bboxMm.max[1] + bboxMm.min[1]) / 2], size, texture: null, heat: null };
  }
  const plane = mapPlane(footprint);
  return { centre: plane.centreMm, size: plane.sizeMm, texture: footprintTexture(footprint), heat: null };
}

function Controls({ target }: { target: readonly [number, number, number] }) {
  const camera = useThree((state) => state.camera);
  const canvas = useThree((state) => state.gl.domElement);
  const invalidate = useThree((state) => state.invalidate);
  const [tx, ty, tz] = target;
  useEffect(() => {
    const controls = new OrbitControls(camera, canvas);
    controls.target.set(tx, ty, tz);
    // The focusable element is the Canvas's wrapper, so the arrow keys are heard there.
    controls.listenToKeyEvents(canvas.closest<HTMLElement>('[data-mold-scene]') ?? canvas);
    controls.update();
    const redraw = () => invalidate();
    controls.addEventListener('change', redraw);
    return () => {
      controls.removeEventListener('change', redraw);
      controls.dispose();
    };
  }, [camera, canvas, invalidate, tx, ty, tz]);
  return null;
}

/**
 * The mould in 3D, Z up as the report measured it, with the resin surface at the fill level and the layer lines; with a
 * forecast, the surface is coloured by each column's forecast peak and the hottest column is ringed.
 */
export default function MoldScene({ file, upAxis, units, bboxMm, levelMm, layerLevelsMm, footprint, footprintLevelMm, heat, describedBy }: MoldSceneProps) {
  const geometry = useMemo(() => moldGeometry(file, upAxis, units), [file, upAxis, units]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  // The floor is where the first layer starts, not a layer of its own: lines go at the layers' tops.
  const layerLines = useMemo(
    () => layerLineGeometry(geometry, layerLevelsMm.slice(1), footprint, footprintLevelMm),
    [geometry, layerLevelsMm, footprint, footprintLevelMm],
  );
  useEffect(() => () => layerLines.dispose(), [layerLines]);
  const surface = useMemo(() => resinSurface(bboxMm, footprint, heat), [bboxMm, footprint, heat]);
  useEffect(() => () => surface.texture?.dispose(), [surface]);

  const size = [0, 1, 2].map((k) => bboxMm.max[k]! - bboxMm.min[k]!);
  const centre = [0, 1, 2].map((k) => (bboxMm.max[k]! + bboxMm.min[k]!) / 2) as [number, number, number];
  const reach = Math.max(...size) * 1.9;
  const camera = {
    position: [centre[0] + reach * 0.55, centre[1] - reach * 0.8, centre[2] + reach * 0.65] as [number, number, number],
    up: [0, 0, 1] as [number, number, number],
    fov: 40,
    near: reach / 200,
    far: reach * 20,
  };

  return (
    <Canvas
      frameloop="demand"
      dpr={[1, 2]}
      camera={camera}
      data-mold-scene=""
      tabIndex={0}
      aria-describedby={describedBy}
      aria-label="The mould in 3D: drag to turn, scroll to zoom, arrow keys to move"
      role="img"
    >
      <color attach="background" args={[paperColour]} />
      <ambientLight intensity={0.7} />
      <directionalLight position={[centre[0] + reach, centre[1] - reach, centre[2] + reach * 2]} intensity={1.6} />
      <directionalLight position={[centre[0] - reach, centre[1] + reach, centre[2] + reach]} intensity={0.5} />
      <mesh geometry={geometry}>
        {/* Pushed back a hair in depth so the layer lines drawn on its walls are never hidden inside them. */}
        <meshStandardMaterial color={woodColour} roughness={0.85} metalness={0} polygonOffset polygonOffsetFactor={1} polygonOffsetUnits={1} />
      </mesh>
      {surface.heat ? (
        <>
          <mesh position={[surface.centre[0], surface.centre[1], levelMm]}>
            <planeGeometry args={surface.size} />
            {/* Unlit, opaque and out of the renderer's tone mapping, so each column shows the scale's own colour, as on the
                map seen from above and the legend; dry columns are cut out. */}
            <meshBasicMaterial
              key={surface.texture?.uuid}
              map={surface.texture}
              alphaTest={0.5}
              toneMapped={false}
              side={DoubleSide}
              polygonOffset
              polygonOffsetFactor={-2}
            />
          </mesh>
          <mesh position={[surface.heat.hottestMm[0], surface.heat.hottestMm[1], levelMm + surface.heat.markerMm / 2]}>
            <torusGeometry args={[surface.heat.markerMm * 2, surface.heat.markerMm / 2, 8, 32]} />
            <meshBasicMaterial color={lineColour} />
          </mesh>
        </>
      ) : (
        <mesh position={[surface.centre[0], surface.centre[1], levelMm]}>
          <planeGeometry args={surface.size} />
          {/* Pulled forward in depth so a level at the rim is not hidden inside the rim's own face. */}
          <meshStandardMaterial
            key={surface.texture ? surface.texture.uuid : 'plain'}
            color={surface.texture ? '#ffffff' : resinColour}
            map={surface.texture}
            transparent
            opacity={0.7}
            side={DoubleSide}
            depthWrite={false}
            polygonOffset
            polygonOffsetFactor={-2}
          />
        </mesh>
      )}
      {layerLevelsMm.length > 1 ? (
        <lineSegments geometry={layerLines}>
          <lineBasicMaterial color={lineColour} />
        </lineSegments>
      ) : null}
      <Controls target={centre} />
    </Canvas>
  );
}
