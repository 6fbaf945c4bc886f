// A 2D context that records the segments of its path and the style of each stroke, for testing
// the map's painters under Node (no canvas there).

export interface Stroke {
  segments: [number, number, number, number][];
  color: unknown;
  width: number;
  alpha: number;
}

export class RecordingContext {
  strokeStyle: unknown = '#000';
  globalAlpha = 1;
  lineWidth = 1;
  lineCap: CanvasLineCap = 'butt';
  lineJoin: CanvasLineJoin = 'miter';
  readonly strokes: Stroke[] = [];
  readonly transforms: number[][] = [];
  readonly clears: number[][] = [];
  private path: [number, number, number, number][] = [];
  private at: [number, number] = [0, 0];

  beginPath(): void {
    this.path = [];
  }
  moveTo(x: number, y: number): void {
    this.at = [x, y];
  }
  lineTo(x: number, y: number): void {
    this.path.push([this.at[0], this.at[1], x, y]);
    this.at = [x, y];
  }
  stroke(): void {
    this.strokes.push({ segments: this.path, color: this.strokeStyle, width: this.lineWidth, alpha: this.globalAlpha });
  }
  setTransform(...m: number[]): void {
    this.transforms.push(m);
  }
  clearRect(...r: number[]): void {
    this.clears.push(r);
  }
}
