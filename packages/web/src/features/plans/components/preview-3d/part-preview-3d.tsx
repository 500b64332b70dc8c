import { Box, Text } from '@chakra-ui/react';
import type { AnalysedPart } from '@jigwright/core';
import { useEffect, useRef } from 'react';
import {
  AmbientLight,
  Color,
  DirectionalLight,
  EdgesGeometry,
  Group,
  LineBasicMaterial,
  LineSegments,
  Mesh,
  MeshStandardMaterial,
  PerspectiveCamera,
  Raycaster,
  Scene,
  Vector2,
  WebGLRenderer,
} from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import { system } from '../../../../theme/system';
import { pieceGeometry } from './part-geometry';
import { benchLayout } from './scene-layout';

const tone = (token: string) => new Color(system.token(`colors.${token}`));

type DrawnPart = Parameters<typeof benchLayout>[0][number] & Pick<AnalysedPart, 'name'>;

/** Pointer travel, px, below which a press and release is a click rather than an orbit. */
const CLICK_SLOP = 4;

/**
 * The parts extruded to their thickness on a bench, to orbit (drag) and zoom (wheel). Clicking a
 * part selects it, as the cut list does; this module is loaded only when asked for, with three.js.
 */
export default function PartPreview3d({
  parts,
  thicknessOf,
  selectedPart,
  onSelectPart,
}: {
  parts: readonly DrawnPart[];
  thicknessOf: (name: string) => number;
  selectedPart: string | null;
  onSelectPart: (name: string) => void;
}) {
  const hostRef = useRef<HTMLDivElement>(null);
  const meshesRef = useRef<Mesh<ReturnType<typeof pieceGeometry>, MeshStandardMaterial>[]>([]);
  const renderRef = useRef<() => void>(() => undefined);
  const selectRef = useRef(onSelectPart);
  useEffect(() => {
    selectRef.current = onSelectPart;
  }, [onSelectPart]);

  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    const layout = benchLayout(parts, thicknessOf);
    const renderer = new WebGLRenderer({ antialias: true, preserveDrawingBuffer: true });
    renderer.setPixelRatio(window.devicePixelRatio);
    const width = host.clientWidth || 640;
    const height = Math.round(width * 0.55);
    renderer.setSize(width, height);
    renderer.domElement.setAttribute('role', 'img');
    renderer.domElement.setAttribute(
      'aria-label',
      `3D preview of ${layout.pieces.length} parts. Drag to orbit, wheel to zoom; click a part to find it in the cut list.`,
    );
    renderer.domElement.dataset.testid = 'preview-3d-canvas';
    host.append(renderer.domElement);

    const scene = new Scene();
    scene.background = tone('birch');
    scene.add(new AmbientLight(0xffffff, 1.4));
    const sun = new DirectionalLight(0xffffff, 2.2);
    sun.position.set(-0.5, 1, 0.8);
    scene.add(sun);

    // Pieces are drawn in the x–y plane and extruded along z; the bench turns them to lie flat.
    const bench = new Group();
    bench.rotation.x = -Math.PI / 2;
    const edges = new LineBasicMaterial({ color: tone('graphite') });
    meshesRef.current = layout.pieces.map((piece) => {
      const geometry = pieceGeometry(piece);
      const mesh = new Mesh(geometry, new MeshStandardMaterial({ color: tone('walnut.200'), roughness: 0.85 }));
      mesh.position.set(piece.position[0] - layout.size[0] / 2, -(piece.position[1] - layout.size[1] / 2), 0);
      mesh.userData.part = piece.name;
      mesh.add(new LineSegments(new EdgesGeometry(geometry, 20), edges));
      bench.add(mesh);
      return mesh;
    });
    scene.add(bench);

    const span = Math.max(layout.size[0], layout.size[1], 100);
    const camera = new PerspectiveCamera(40, width / height, span / 100, span * 20);
    camera.position.set(span * 0.1, span * 0.95, span * 1.15);
    const controls = new OrbitControls(camera, renderer.domElement);
    controls.enableDamping = false;
    const render = () => renderer.render(scene, camera);
    renderRef.current = render;
    controls.addEventListener('change', render);

    let down: { x: number; y: number } | null = null;
    const onDown = (event: PointerEvent) => (down = { x: event.clientX, y: event.clientY });
    const onUp = (event: PointerEvent) => {
      if (!down || Math.hypot(event.clientX - down.x, event.clientY - down.y) > CLICK_SLOP) return;
      const rect = renderer.domElement.getBoundingClientRect();
      const pointer = new Vector2(
        ((event.clientX - rect.left) / rect.width) * 2 - 1,
        -((event.clientY - rect.top) / rect.height) * 2 + 1,
      );
      const ray = new Raycaster();
      ray.setFromCamera(pointer, camera);
      const hit = ray.intersectObjects(meshesRef.current, false)[0];
      if (hit) selectRef.current(String(hit.object.userData.part));
    };
    renderer.domElement.addEventListener('pointerdown', onDown);
    renderer.domElement.addEventListener('pointerup', onUp);
    render();

    return () => {
      controls.dispose();
      renderer.domElement.removeEventListener('pointerdown', onDown);
      renderer.domElement.removeEventListener('pointerup', onUp);
      for (const mesh of meshesRef.current) {
        mesh.geometry.dispose();
        mesh.material.dispose();
      }
      edges.dispose();
      renderer.dispose();
      renderer.domElement.remove();
    };
  }, [parts, thicknessOf]);

  useEffect(() => {
    for (const mesh of meshesRef.current) {
      mesh.material.color.set(tone(mesh.userData.part === selectedPart ? 'steel.300' : 'walnut.200'));
    }
    renderRef.current();
  }, [selectedPart, parts, thicknessOf]);

  return (
    <Box>
      <Box ref={hostRef} borderWidth="1px" borderColor="border" borderRadius="md" overflow="hidden" />
      <Text mt="1" fontSize="sm" color="fg.muted" aria-live="polite">
        {selectedPart ? `Selected: ${selectedPart}` : 'Click a part to find it in the cut list.'}
      </Text>
    </Box>
  );
}
