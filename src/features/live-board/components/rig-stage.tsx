import { useCallback, useEffect, useImperativeHandle, useMemo, useRef, useState, type Ref } from "react";
import type Konva from "konva";
import { Circle, Layer, Line, Rect, Shape, Stage, Text } from "react-konva";
import type { ElementLook, SceneLayout, SceneShape } from "@sim/catalog";
import { cx } from "@/lib/cx";
import { fitView, formatHeight, highestPoint, type StageFit } from "../utils/stage-fit";

/**
 * Colours of the board theme (tailwind.config.ts `themes.board`), repeated here because the
 * canvas cannot read CSS variables cheaply. The chain is amber: bright on the dark board and
 * apart from the blue and green marks for the common colour-vision deficiencies.
 */
const PALETTE = {
  ink: "#F4F1E8",
  muted: "#B9C0CD",
  line: "#8792A8",
  floor: "#2C3850",
  fixture: "#8792A8",
  pan: "#7CC3F2",
  chain: "#F2C35B",
  chainAlt: "#D9A63A",
  tubeInside: "#0F1522",
  thread: "#B9C0CD",
  top: "#5CD1AC",
} as const;

const ROLE_FILL: Record<SceneShape["role"], string> = {
  floor: PALETTE.floor,
  wall: PALETTE.fixture,
  pot: PALETTE.fixture,
  pan: PALETTE.pan,
  support: PALETTE.muted,
  table: PALETTE.fixture,
  rim: PALETTE.muted,
  hook: PALETTE.muted,
};

export interface RigStageHandle {
  /** Draws one frame of the chain now; returns how long the drawing took, ms. */
  draw(frame: Float32Array | null, moving: readonly SceneShape[]): number;
}

interface RigStageProps {
  scene: SceneLayout;
  elements: readonly ElementLook[];
  /** The chain to show until the first draw() (the rig at rest). */
  frame?: Float32Array | null;
  moving?: readonly SceneShape[];
  /** Read out by screen readers, e.g. "The fountain rig at rest". */
  label: string;
  className?: string;
  ref?: Ref<RigStageHandle>;
}

/**
 * The rig drawn to scale, y up. Two layers: the fixed scene and height marks (drawn only when
 * the size or scene changes), and the chain, one custom shape that strokes every link in a few
 * canvas paths: the board draws each playback frame into it without a React render.
 */
export function RigStage({ scene, elements, frame = null, moving = [], label, className, ref }: RigStageProps) {
  const box = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 0, height: 0 });
  const chainLayer = useRef<Konva.Layer>(null);
  const current = useRef<{ frame: Float32Array | null; moving: readonly SceneShape[] }>({ frame, moving });

  useEffect(() => {
    current.current = { frame, moving };
    chainLayer.current?.batchDraw();
  }, [frame, moving]);

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const measure = () => setSize({ width: Math.floor(el.clientWidth), height: Math.floor(el.clientHeight) });
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  const fontSize = Math.round(Math.min(32, Math.max(14, size.height * 0.035)));
  const margins = useMemo(() => ({ left: fontSize * 8, right: fontSize, top: fontSize * 1.6, bottom: fontSize * 0.8 }), [fontSize]);
  const fit = useMemo(() => fitView(scene.view, size.width, size.height, margins), [scene.view, size.width, size.height, margins]);
  const fitRef = useRef<StageFit>(fit);
  fitRef.current = fit;
  const elementsRef = useRef(elements);
  elementsRef.current = elements;
  const geometry = useRef({ fontSize, left: margins.left, right: size.width - margins.right });
  geometry.current = { fontSize, left: margins.left, right: size.width - margins.right };

  const drawChain = useCallback((context: Konva.Context) => {
    const { frame: f, moving: m } = current.current;
    const c = context._context;
    drawMoving(c, m, fitRef.current);
    if (f) {
      drawLinks(c, f, elementsRef.current, fitRef.current);
      drawTopMark(c, f, fitRef.current, geometry.current);
    }
  }, []);

  useImperativeHandle(
    ref,
    () => ({
      draw(f, m) {
        current.current = { frame: f, moving: m };
        const started = performance.now();
        chainLayer.current?.draw();
        return performance.now() - started;
      },
    }),
    [],
  );

  return (
    <div ref={box} role="img" aria-label={label} className={cx("relative min-h-0 overflow-hidden", className)}>
      {size.width > 0 && size.height > 0 ? (
        <Stage width={size.width} height={size.height} listening={false}>
          <Layer listening={false}>
            {scene.shapes.map((shape, i) => (
              <SceneShapeNode key={i} shape={shape} fit={fit} />
            ))}
            {scene.marks.map((mark) => (
              <HeightMark key={mark.label} label={mark.label} y={fit.y(mark.y)} height={mark.y} fontSize={fontSize} left={margins.left} right={size.width - margins.right} />
            ))}
          </Layer>
          <Layer ref={chainLayer} listening={false}>
            <Shape sceneFunc={drawChain} listening={false} perfectDrawEnabled={false} />
          </Layer>
        </Stage>
      ) : null}
    </div>
  );
}

function SceneShapeNode({ shape, fit }: { shape: SceneShape; fit: StageFit }) {
  const fill = ROLE_FILL[shape.role];
  if (shape.kind === "circle") {
    return <Circle x={fit.x(shape.x)} y={fit.y(shape.y)} radius={Math.max(2, shape.radius * fit.scale)} fill={fill} listening={false} />;
  }
  const w = Math.max(1, shape.width * fit.scale);
  const h = Math.max(1, shape.height * fit.scale);
  return (
    <Rect
      x={fit.x(shape.x)}
      y={fit.y(shape.y)}
      width={w}
      height={h}
      offsetX={w / 2}
      offsetY={h / 2}
      // Scene angles turn anticlockwise with y up; the screen's y runs down.
      rotation={(-shape.angle * 180) / Math.PI}
      fill={fill}
      listening={false}
    />
  );
}

function HeightMark({ label, y, height, fontSize, left, right }: { label: string; y: number; height: number; fontSize: number; left: number; right: number }) {
  return (
    <>
      <Line points={[left - fontSize * 0.5, y, right, y]} stroke={PALETTE.line} strokeWidth={1.5} dash={[8, 6]} listening={false} />
      <Text
        x={4}
        y={y - fontSize * 1.15}
        width={left - fontSize}
        text={`${label} ${formatHeight(height)}`}
        fontSize={fontSize}
        fontFamily='"Atkinson Hyperlegible Next", system-ui, sans-serif'
        fill={PALETTE.muted}
        listening={false}
      />
    </>
  );
}

function drawMoving(c: CanvasRenderingContext2D, moving: readonly SceneShape[], fit: StageFit) {
  for (const shape of moving) {
    c.fillStyle = ROLE_FILL[shape.role];
    c.beginPath();
    if (shape.kind === "circle") {
      c.arc(fit.x(shape.x), fit.y(shape.y), Math.max(2, shape.radius * fit.scale), 0, 2 * Math.PI);
    } else {
      c.save();
      c.translate(fit.x(shape.x), fit.y(shape.y));
      c.rotate(-shape.angle);
      const w = Math.max(1, shape.width * fit.scale);
      const h = Math.max(1, shape.height * fit.scale);
      c.rect(-w / 2, -h / 2, w, h);
      c.restore();
    }
    c.fill();
  }
}

/**
 * Every element of one frame in a handful of paths: rods as round-ended strokes of their
 * thickness (alternate links a shade apart, so single links stay visible), tubes as hollow
 * strokes, threads as thin lines, balls and beads as discs. Hidden (NaN) elements are skipped.
 */
function drawLinks(c: CanvasRenderingContext2D, frame: Float32Array, elements: readonly ElementLook[], fit: StageFit) {
  const s = fit.scale;
  const kinds = new Set(elements.map((e) => e.kind));
  const strokeKind = (kind: ElementLook["kind"], parity: number | null, colour: string, cap: CanvasLineCap, widthShare = 1) => {
    c.beginPath();
    let width = 0;
    for (let i = 0; i < elements.length; i++) {
      const e = elements[i]!;
      if (e.kind !== kind || (parity !== null && i % 2 !== parity)) continue;
      const x = frame[i * 3]!;
      const y = frame[i * 3 + 1]!;
      const a = frame[i * 3 + 2]!;
      if (Number.isNaN(x) || Number.isNaN(y)) continue;
      width = e.thickness;
      // Round caps add half the thickness at each end: shorten the stroke to keep the length.
      const half = ((cap === "round" ? e.length - e.thickness : e.length) / 2) * s;
      const dx = Math.cos(a) * half;
      const dy = -Math.sin(a) * half;
      const px = fit.x(x);
      const py = fit.y(y);
      c.moveTo(px - dx, py - dy);
      c.lineTo(px + dx, py + dy);
    }
    c.lineCap = cap;
    c.lineWidth = Math.max(1.2, width * s * widthShare);
    c.strokeStyle = colour;
    c.stroke();
  };
  if (kinds.has("thread")) strokeKind("thread", null, PALETTE.thread, "round");
  if (kinds.has("rod")) {
    strokeKind("rod", 0, PALETTE.chain, "round");
    strokeKind("rod", 1, PALETTE.chainAlt, "round");
  }
  if (kinds.has("tube")) {
    strokeKind("tube", null, PALETTE.chain, "butt");
    strokeKind("tube", null, PALETTE.tubeInside, "butt", 0.45);
  }
  if (kinds.has("ball") || kinds.has("bead")) {
    c.beginPath();
    for (let i = 0; i < elements.length; i++) {
      const e = elements[i]!;
      if (e.kind !== "ball" && e.kind !== "bead") continue;
      const x = frame[i * 3]!;
      const y = frame[i * 3 + 1]!;
      if (Number.isNaN(x) || Number.isNaN(y)) continue;
      const r = Math.max(1, (e.length / 2) * s);
      const px = fit.x(x);
      const py = fit.y(y);
      c.moveTo(px + r, py);
      c.arc(px, py, r, 0, 2 * Math.PI);
    }
    c.fillStyle = PALETTE.chain;
    c.fill();
  }
}

/** A dashed line at the chain's highest point, with its height. */
function drawTopMark(c: CanvasRenderingContext2D, frame: Float32Array, fit: StageFit, g: { fontSize: number; left: number; right: number }) {
  const top = highestPoint(frame);
  if (top === null) return;
  const y = fit.y(top);
  c.save();
  c.setLineDash([3, 5]);
  c.lineWidth = 2;
  c.strokeStyle = PALETTE.top;
  c.beginPath();
  c.moveTo(g.left - g.fontSize * 0.5, y);
  c.lineTo(g.right, y);
  c.stroke();
  c.setLineDash([]);
  // On the right, so it never covers the fixed marks' labels on the left.
  c.fillStyle = PALETTE.top;
  c.font = `bold ${g.fontSize}px "Atkinson Hyperlegible Next", system-ui, sans-serif`;
  c.textBaseline = "bottom";
  c.textAlign = "right";
  c.fillText(`Top of chain ${formatHeight(top)}`, g.right, y - 3);
  c.restore();
}
