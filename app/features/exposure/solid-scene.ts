// The 3D view's scene (three.js, loaded only by this page): the 100 % boundary of each tier as a
// solid, the levels as slabs, obstructions as blocks, the antennas as boxes turned to their azimuth
// and tilted down, orbit controls. Site axes as they are: x east, y north, z up (camera.up = z).
import * as THREE from "three";
import { OrbitControls } from "three/addons/controls/OrbitControls.js";
import { mergeVertices } from "three/addons/utils/BufferGeometryUtils.js";
import type { EmitterInput } from "~/engine";
import type { XY } from "./section-geometry";
import { solidColours } from "./solid-style";

export type SceneInput = {
  general: Float32Array;
  occupational: Float32Array;
  levels: { polygon: XY[]; elevationM: number }[];
  obstructions: { polygon: XY[]; baseM: number; heightM: number }[];
  emitters: EmitterInput[];
  show: { general: boolean; occupational: boolean };
};

/** A token of app.css (e.g. "paper-deep") as a three.js colour. */
function token(name: string, fallback: string) {
  const value = typeof document === "undefined" ? "" : getComputedStyle(document.documentElement).getPropertyValue(`--color-${name}`).trim();
  return new THREE.Color(value || fallback);
}

function prism(polygon: XY[], base: number, height: number, material: THREE.Material, edges: THREE.LineBasicMaterial) {
  const shape = new THREE.Shape(polygon.map(([x, y]) => new THREE.Vector2(x, y)));
  const geometry = new THREE.ExtrudeGeometry(shape, { depth: height, bevelEnabled: false });
  geometry.translate(0, 0, base);
  const group = new THREE.Group();
  group.add(new THREE.Mesh(geometry, material));
  group.add(new THREE.LineSegments(new THREE.EdgesGeometry(geometry), edges));
  return group;
}

function boundary(positions: Float32Array, colour: string, opacity: number) {
  let geometry = new THREE.BufferGeometry();
  geometry.setAttribute("position", new THREE.BufferAttribute(positions, 3));
  geometry = mergeVertices(geometry, 1e-4);
  geometry.computeVertexNormals();
  const material = new THREE.MeshLambertMaterial({ color: new THREE.Color(colour), transparent: opacity < 1, opacity, side: THREE.DoubleSide, depthWrite: opacity >= 1 });
  return new THREE.Mesh(geometry, material);
}

/** Mounts the scene in `host`; returns its controls: redraw with other layers shown, and dispose. */
export function mountSolidScene(host: HTMLElement, input: SceneInput, onFirstFrame: () => void) {
  const width = host.clientWidth || 960;
  const height = host.clientHeight || Math.round(width * 0.6);
  const renderer = new THREE.WebGLRenderer({ antialias: true, preserveDrawingBuffer: true });
  renderer.setPixelRatio(Math.min(2, window.devicePixelRatio || 1));
  renderer.setSize(width, height);
  renderer.setClearColor(token("sheet", "#ffffff"));
  renderer.domElement.setAttribute("aria-label", "3D view of the compliance boundaries; drag to rotate, scroll to zoom");
  renderer.domElement.setAttribute("role", "img");
  renderer.domElement.dataset.testid = "solid-canvas";
  host.replaceChildren(renderer.domElement);

  const scene = new THREE.Scene();
  scene.add(new THREE.HemisphereLight(0xffffff, 0x8c877a, 2.2));
  const sun = new THREE.DirectionalLight(0xffffff, 1.6);
  sun.position.set(-30, -40, 60);
  scene.add(sun);

  const slabMaterial = new THREE.MeshLambertMaterial({ color: token("paper-deep", "#e9e6dc") });
  const blockMaterial = new THREE.MeshLambertMaterial({ color: token("graphite-300", "#b9b5a8") });
  const edgeMaterial = new THREE.LineBasicMaterial({ color: token("graphite-600", "#59564c") });
  for (const l of input.levels) scene.add(prism(l.polygon, l.elevationM - 0.3, 0.3, slabMaterial, edgeMaterial));
  for (const o of input.obstructions) scene.add(prism(o.polygon, o.baseM, o.heightM, blockMaterial, edgeMaterial));

  const antennaMaterial = new THREE.MeshLambertMaterial({ color: token("ink-900", "#171b22") });
  for (const e of input.emitters) {
    const h = e.apertureM && e.model !== "aperture" ? e.apertureM : 1.2;
    const box = new THREE.Mesh(new THREE.BoxGeometry(0.3, 0.15, h), antennaMaterial);
    box.position.set(e.position.x, e.position.y, e.position.z);
    // Tilt down about the antenna's own x (its face turns from +y towards −z), then turn to the azimuth (clockwise from north).
    box.rotation.set((-(e.tiltDeg ?? 0) * Math.PI) / 180, 0, (-(e.azimuthDeg ?? 0) * Math.PI) / 180, "ZXY");
    scene.add(box);
  }

  const colours = solidColours();
  const general = boundary(input.general, colours.general, 0.38);
  const occupational = boundary(input.occupational, colours.occupational, 0.92);
  scene.add(general, occupational);

  // Frame everything from the south-west, above.
  const box = new THREE.Box3().setFromObject(scene);
  const centre = box.getCenter(new THREE.Vector3());
  const size = box.getSize(new THREE.Vector3()).length();
  const camera = new THREE.PerspectiveCamera(40, width / height, 0.1, size * 10);
  camera.up.set(0, 0, 1);
  camera.position.set(centre.x - size * 0.32, centre.y - size * 0.55, centre.z + size * 0.38);
  const controls = new OrbitControls(camera, renderer.domElement);
  controls.target.copy(centre);
  controls.update();

  let first = true;
  const render = () => {
    general.visible = input.show.general;
    occupational.visible = input.show.occupational;
    renderer.render(scene, camera);
    if (first) {
      first = false;
      onFirstFrame();
    }
  };
  controls.addEventListener("change", render);
  render();
  // Follow the page's width (a window resized, a phone turned).
  const resize = new ResizeObserver(() => {
    const w = host.clientWidth;
    const h = host.clientHeight;
    if (!w || !h) return;
    renderer.setSize(w, h);
    camera.aspect = w / h;
    camera.updateProjectionMatrix();
    render();
  });
  resize.observe(host);

  return {
    redraw: (show: SceneInput["show"]) => {
      input.show = show;
      render();
    },
    dispose: () => {
      resize.disconnect();
      controls.dispose();
      scene.traverse((o) => {
        if (o instanceof THREE.Mesh || o instanceof THREE.LineSegments) o.geometry.dispose();
      });
      renderer.dispose();
      renderer.domElement.remove();
    },
  };
}
