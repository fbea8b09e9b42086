import type { BedVessel, Scenario, Shape } from '../../../../shared/scenario';
import {
  type ElevationLayout,
  layoutElevation,
} from '../systems/elevation-drawing/elevation-layout';

/** A vessel in side elevation, metres: left edge, width, floor elevation and rim height. */
export interface SceneVessel {
  readonly id: string;
  readonly kind: 'tank' | 'sump' | 'bed';
  readonly xM: number;
  readonly widthM: number;
  readonly floorM: number;
  readonly heightM: number;
  /** Plan area at the floor, m² (for the filling rate). */
  readonly planAreaM2: number;
}

/** A bed with its drain parts, metres (heights above the bed floor). */
export interface SceneBed extends SceneVessel {
  readonly centreXM: number;
  readonly media: BedVessel['media'];
  readonly drain: BedVessel['drain'];
  /** Bell top (standpipe top + cap gap), or null for a plain standpipe. */
  readonly bellTopM: number | null;
  /** Level at which air enters the bell and the siphon breaks. */
  readonly breakLevelM: number | null;
}

/** A pipe the water runs along, through points (x, z) in metres, with the flow channel it shows. */
export interface ScenePipe {
  readonly id: string;
  readonly kind: 'drain' | 'pump-line' | 'overflow' | 'leak';
  readonly channelId: string;
  readonly points: readonly (readonly [number, number])[];
  readonly boreM: number;
  /** The bed a drain belongs to (its standpipe is the first leg), else null. */
  readonly bedId: string | null;
}

/** A pump symbol: its body's corner, size, and the flow channel of the whole pump. */
export interface ScenePump {
  readonly id: string;
  readonly xM: number;
  readonly zM: number;
  readonly sizeM: number;
  readonly channelId: string;
  readonly initialState: 'on' | 'off';
}

/** Everything the cross-section draws, in metres, with the elevation layout it extends. */
export interface CrossSectionScene {
  readonly layout: ElevationLayout;
  readonly vessels: readonly SceneVessel[];
  readonly beds: readonly SceneBed[];
  readonly pipes: readonly ScenePipe[];
  readonly pumps: readonly ScenePump[];
}

/** Length of the stub that marks a leak, m. */
const LEAK_STUB_M = 0.12;

function planAreaM2(shape: Shape): number {
  if (shape.type === 'box') return shape.length * shape.width;
  if (shape.type === 'cylinder') return (Math.PI / 4) * shape.diameter ** 2;
  return shape.points[0]?.area ?? 0;
}

/**
 * The scene of `scenario`: the shared side-elevation layout (vessels side by side, to scale) plus
 * what the animation needs: each bed's drain parts, each pipe's path and flow channel (a drain
 * starts at its standpipe top; an overflow runs on to the vessel it feeds), and the pumps.
 */
export function buildCrossSectionScene(scenario: Scenario): CrossSectionScene {
  const layout = layoutElevation(scenario);
  const vessels: SceneVessel[] = [];
  const beds: SceneBed[] = [];
  for (const vessel of scenario.vessels) {
    const box = layout.boxes.find((b) => b.kind === 'vessel' && b.id === vessel.id);
    if (!box) continue;
    const base: SceneVessel = {
      id: vessel.id,
      kind: vessel.kind,
      xM: box.x,
      widthM: box.width,
      floorM: vessel.floorElevation,
      heightM: vessel.height,
      planAreaM2: planAreaM2(vessel.shape),
    };
    vessels.push(base);
    if (vessel.kind === 'bed') beds.push(sceneBed(vessel, base));
  }
  return {
    layout,
    vessels,
    beds,
    pipes: scenePipes(scenario, layout, vessels, beds),
    pumps: scenePumps(scenario, layout),
  };
}

function sceneBed(bed: BedVessel, base: SceneVessel): SceneBed {
  const drain = bed.drain;
  const bell = drain.type === 'bell-siphon' ? drain.bell : null;
  return {
    ...base,
    centreXM: base.xM + base.widthM / 2,
    media: bed.media,
    drain,
    bellTopM: bell ? drain.standpipe.height + bell.capGap : null,
    breakLevelM: bell ? (bell.snorkelHeight ?? bell.intakeHeight) : null,
  };
}

function scenePipes(
  scenario: Scenario,
  layout: ElevationLayout,
  vessels: readonly SceneVessel[],
  beds: readonly SceneBed[],
): ScenePipe[] {
  const pipes: ScenePipe[] = [];
  for (const line of layout.lines) {
    if (line.kind === 'drain') {
      const bed = beds.find((b) => b.id === line.id);
      const first = line.points[0];
      if (!bed || !first) continue;
      const top: [number, number] = [first[0], bed.floorM + bed.drain.standpipe.height];
      pipes.push({
        id: `drain:${bed.id}`,
        kind: 'drain',
        channelId: `flow:${bed.id}.drain`,
        points: [top, ...line.points],
        boreM: line.widthM,
        bedId: bed.id,
      });
    } else if (line.kind === 'pump-line') {
      const [pumpId = '', index = '0'] = line.id.split(':');
      pipes.push({
        id: `pump-line:${line.id}`,
        kind: 'pump-line',
        channelId: `flow:${pumpId}.outlet[${index}]`,
        points: line.points,
        boreM: line.widthM,
        bedId: null,
      });
    } else if (line.kind === 'overflow') {
      pipes.push(overflowPipe(scenario, line.id, line.points, line.widthM, vessels));
    }
  }
  scenario.leaks.forEach((leak, k) => {
    const from = vessels.find((v) => v.id === leak.from);
    if (!from) return;
    pipes.push({
      id: `leak:${k}`,
      kind: 'leak',
      channelId: `flow:leak[${k}]`,
      points: [
        [from.xM, leak.elevation],
        [from.xM - LEAK_STUB_M, leak.elevation],
        [from.xM - LEAK_STUB_M, leak.elevation - LEAK_STUB_M],
      ],
      boreM: leak.diameter,
      bedId: null,
    });
  });
  return pipes;
}

/** An overflow: out through the wall, then across and down into the vessel it feeds. */
function overflowPipe(
  scenario: Scenario,
  vesselId: string,
  stub: readonly (readonly [number, number])[],
  boreM: number,
  vessels: readonly SceneVessel[],
): ScenePipe {
  const to = scenario.vessels.find((v) => v.id === vesselId)?.overflow?.to;
  const target = vessels.find((v) => v.id === to);
  const start = stub[0] ?? [0, 0];
  const points: (readonly [number, number])[] = [...stub];
  if (target) {
    const entryX =
      target.xM > start[0] ? target.xM + boreM * 2 : target.xM + target.widthM - boreM * 2;
    const rimM = target.floorM + target.heightM;
    points.splice(1, points.length - 1, [entryX, start[1]]);
    if (rimM < start[1]) points.push([entryX, rimM]);
  }
  return {
    id: `overflow:${vesselId}`,
    kind: 'overflow',
    channelId: `flow:${vesselId}.overflow`,
    points,
    boreM,
    bedId: null,
  };
}

function scenePumps(scenario: Scenario, layout: ElevationLayout): ScenePump[] {
  return scenario.pumps.flatMap((pump) => {
    const box = layout.boxes.find((b) => b.kind === 'pump' && b.id === pump.id);
    if (!box) return [];
    return [
      {
        id: pump.id,
        xM: box.x,
        zM: box.z,
        sizeM: box.width,
        channelId: `flow:${pump.id}`,
        initialState: pump.initialState,
      },
    ];
  });
}
