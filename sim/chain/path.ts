/** A point in the internal frame (mm, y down). */
export interface Point {
  x: number;
  y: number;
}

/**
 * Walk along a polyline placing points at exact straight-line (chord) distances, so links
 * laid on a curved path start with their joints exactly closed.
 * Returns one more point than there are chords; stops early if the polyline runs out.
 */
export function layAlongPath(path: readonly Point[], chords: readonly number[]): Point[] {
  if (path.length < 2) throw new Error("layAlongPath needs at least two points");
  const out: Point[] = [{ ...path[0]! }];
  let segment = 0;
  let from = path[0]!;
  for (const chord of chords) {
    let placed: Point | null = null;
    while (segment < path.length - 1) {
      const start = segment === 0 && out.length === 1 ? path[0]! : path[segment]!;
      const end = path[segment + 1]!;
      placed = circleHitsSegment(from, chord, start, end);
      if (placed) break;
      segment += 1;
    }
    if (!placed) break;
    out.push(placed);
    from = placed;
  }
  return out;
}

/** The point on segment [p, q], beyond the part already walked, at distance r from c. */
function circleHitsSegment(c: Point, r: number, p: Point, q: Point): Point | null {
  const dx = q.x - p.x;
  const dy = q.y - p.y;
  const fx = p.x - c.x;
  const fy = p.y - c.y;
  const a = dx * dx + dy * dy;
  if (a === 0) return null;
  const b = 2 * (fx * dx + fy * dy);
  const cc = fx * fx + fy * fy - r * r;
  const disc = b * b - 4 * a * cc;
  if (disc < 0) return null;
  // The far root: moving forward along the segment, away from c.
  const t = (-b + Math.sqrt(disc)) / (2 * a);
  if (t < 0 || t > 1) return null;
  return { x: p.x + t * dx, y: p.y + t * dy };
}

/** Points on a circular arc, from angle a0 to a1 (radians, internal frame). */
export function arc(cx: number, cy: number, radius: number, a0: number, a1: number, pieces = 48): Point[] {
  const out: Point[] = [];
  for (let i = 0; i <= pieces; i++) {
    const a = a0 + ((a1 - a0) * i) / pieces;
    out.push({ x: cx + radius * Math.cos(a), y: cy + radius * Math.sin(a) });
  }
  return out;
}
