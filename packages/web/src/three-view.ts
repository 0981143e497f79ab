/**
 * The 3D view: draws a {@link JointModel} with three.js and orbits it with a
 * finger or the mouse (OrbitControls: one finger or the left button turns,
 * two fingers or the wheel zoom). The cut pipe is light, what it meets is
 * darker, the cut line is bright, HEEL and TOE are written where they are.
 * Without WebGL the view says so and the rest of the page works.
 */
import {
  AmbientLight,
  Box3,
  BufferGeometry,
  CanvasTexture,
  Color,
  DirectionalLight,
  DoubleSide,
  Float32BufferAttribute,
  Group,
  LineBasicMaterial,
  LineLoop,
  Mesh,
  MeshStandardMaterial,
  PerspectiveCamera,
  Scene,
  Sprite,
  SpriteMaterial,
  Vector3,
  WebGLRenderer,
} from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import type { JointModel, ModelSurface } from './joint-model.js';

/** A live 3D view in a container. */
export interface JointView {
  /** Replaces the drawn joint. */
  show(model: JointModel): void;
  /** Draws nothing (no result for the form as it is). */
  clear(): void;
}

function surfaceMesh(surface: ModelSurface): Mesh {
  const rows = surface.grid.length;
  const cols = surface.grid[0]?.length ?? 0;
  const positions: number[] = [];
  for (const row of surface.grid) for (const p of row) positions.push(p[0], p[1], p[2]);
  const index: number[] = [];
  for (let i = 0; i + 1 < rows; i++) {
    for (let j = 0; j + 1 < cols; j++) {
      const a = i * cols + j;
      const b = (i + 1) * cols + j;
      index.push(a, b, a + 1, b, b + 1, a + 1);
    }
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
  geometry.setIndex(index);
  geometry.computeVertexNormals();
  // What the template cuts is light and solid; what it meets is darker and lets the cut line show through.
  const host = surface.role === 'host';
  const material = new MeshStandardMaterial({ color: host ? 0x5a6b7a : 0xd9d9d9, side: DoubleSide, metalness: 0.2, roughness: 0.6, transparent: host, opacity: host ? 0.7 : 1 });
  return new Mesh(geometry, material);
}

function label(text: string, sizeMm: number): Sprite {
  const canvas = document.createElement('canvas');
  canvas.width = 256;
  canvas.height = 64;
  const g = canvas.getContext('2d');
  if (g !== null) {
    g.fillStyle = '#000';
    g.fillRect(0, 0, 256, 64);
    g.fillStyle = '#ffd400';
    g.font = 'bold 40px sans-serif';
    g.textAlign = 'center';
    g.textBaseline = 'middle';
    g.fillText(text, 128, 34);
  }
  const sprite = new Sprite(new SpriteMaterial({ map: new CanvasTexture(canvas), depthTest: false }));
  sprite.scale.set(sizeMm * 0.32, sizeMm * 0.08, 1);
  sprite.renderOrder = 2;
  return sprite;
}

function hasWebGl(): boolean {
  try {
    const canvas = document.createElement('canvas');
    return (canvas.getContext('webgl2') ?? canvas.getContext('webgl')) !== null;
  } catch {
    return false;
  }
}

/**
 * Starts a 3D view in `container` (which sets its size), or says in it that
 * the browser has no 3D drawing. Renders only when something changes.
 * @example const view = startJointView(div); view.show(jointModel(result));
 */
export function startJointView(container: HTMLElement): JointView {
  if (!hasWebGl()) {
    container.textContent = 'This browser cannot draw 3D here (no WebGL); the table and template are complete without it.';
    container.classList.add('no-3d');
    return { show: () => undefined, clear: () => undefined };
  }
  const renderer = new WebGLRenderer({ antialias: true, preserveDrawingBuffer: true });
  renderer.setPixelRatio(Math.min(globalThis.devicePixelRatio ?? 1, 2));
  container.append(renderer.domElement);
  renderer.domElement.setAttribute('aria-label', 'The joint in 3D; drag to turn, pinch or scroll to zoom');
  renderer.domElement.setAttribute('role', 'img');
  const scene = new Scene();
  scene.background = new Color(0x101418);
  scene.add(new AmbientLight(0xffffff, 0.9));
  const sun = new DirectionalLight(0xffffff, 1.6);
  scene.add(sun);
  const camera = new PerspectiveCamera(40, 1, 1, 100000);
  camera.up.set(0, 0, 1);
  const controls = new OrbitControls(camera, renderer.domElement);
  let joint = new Group();
  scene.add(joint);

  const render = (): void => {
    sun.position.copy(camera.position);
    renderer.render(scene, camera);
  };
  const resize = (): void => {
    const w = Math.max(container.clientWidth, 1);
    const h = Math.max(container.clientHeight, 1);
    renderer.setSize(w, h, false);
    renderer.domElement.style.width = '100%';
    renderer.domElement.style.height = '100%';
    camera.aspect = w / h;
    camera.updateProjectionMatrix();
    render();
  };
  controls.addEventListener('change', render);
  new ResizeObserver(resize).observe(container);

  let framed = '';
  const drop = (): void => {
    scene.remove(joint);
    joint.traverse((o) => {
      if (o instanceof Mesh || o instanceof LineLoop || o instanceof Sprite) {
        o.geometry.dispose();
        const m = o.material as { dispose(): void; map?: { dispose(): void } | null };
        m.map?.dispose();
        m.dispose();
      }
    });
    joint = new Group();
  };
  return {
    clear() {
      drop();
      render();
    },
    show(model) {
      drop();
      for (const s of model.surfaces) joint.add(surfaceMesh(s));
      for (const line of model.cutLines) {
        const g = new BufferGeometry();
        g.setAttribute('position', new Float32BufferAttribute(line.flatMap((p) => [p[0], p[1], p[2]]), 3));
        const loop = new LineLoop(g, new LineBasicMaterial({ color: 0xff3b30, depthTest: false }));
        loop.renderOrder = 1;
        joint.add(loop);
      }
      const box = new Box3().setFromObject(joint);
      const centre = box.getCenter(new Vector3());
      const radius = Math.max(box.getSize(new Vector3()).length() / 2, 1);
      for (const l of model.labels) {
        // Words stand a little off the pipe, away from the joint's centre, so they do not hide the cut line.
        const at = new Vector3(l.at[0], l.at[1], l.at[2]);
        const out = at.clone().sub(centre);
        if (out.lengthSq() > 0) at.addScaledVector(out.normalize(), 0.12 * radius);
        const sprite = label(l.text, radius * 1.3);
        sprite.position.copy(at);
        joint.add(sprite);
      }
      scene.add(joint);
      // Frame the joint when a new kind or size comes; otherwise keep the fitter's view.
      const key = `${model.viewFrom.join(',')}|${Math.round(Math.log2(radius) * 3)}`;
      if (key !== framed) {
        framed = key;
        const dir = new Vector3(...model.viewFrom).normalize();
        const distance = radius / Math.sin((camera.fov * Math.PI) / 360) * 1.05;
        camera.position.copy(centre).addScaledVector(dir, distance);
        camera.near = distance / 100;
        camera.far = distance * 10;
        camera.updateProjectionMatrix();
        controls.target.copy(centre);
        controls.update();
      }
      render();
    },
  };
}
