// One replication: the kernel's event loop driving the line model, which reports to a recorder. This
// module is where the three meet; the model knows only the Observer interface and the recorder knows
// nothing of the model, so each can be read, tested and replaced on its own.
import { EventLoop } from './kernel/event-loop';
import { EventQueue } from './kernel/event-queue';
import type { CompiledLine } from './model/compile';
import { LineModel } from './model/line-model';
import { PROFILE_EMPTY, PROFILE_LOADED } from './model/motion';
import { EV_END, EV_LAST_ACTIVE, type LineState } from './model/state';
import { Recorder } from './observe/recorder';
import type { StreamFactory } from './random/streams';

export type ReplicationConfig = {
  warmupSeconds: number;
  endSeconds: number;
  timeBins: number;
  positionBins: number;
  /** Events allowed in this replication before it stops. */
  eventBudget: number;
  /** Check overlap and conservation after every event (tests). */
  checkInvariants?: boolean;
  /**
   * Simulation time at which the replication starts (default 0); warmupSeconds and endSeconds are on
   * the same clock. Tests start late to show that results do not depend on the clock's magnitude.
   */
  originSeconds?: number;
};

export class Replication {
  readonly state: LineState;
  readonly recorder: Recorder;
  private readonly model: LineModel;
  private readonly loop: EventLoop;

  constructor(line: CompiledLine, streams: StreamFactory, config: ReplicationConfig) {
    // The bottleneck analysis bridges the in-feed gap of a queued carrier, with half again for margin.
    const inFeed = Math.max(
      line.motion.moveSeconds(line.pitchMm, PROFILE_LOADED),
      line.motion.moveSeconds(line.pitchMm, PROFILE_EMPTY),
    );
    this.recorder = new Recorder(
      line,
      config.warmupSeconds,
      config.endSeconds,
      config.timeBins,
      config.positionBins,
      1.5 * inFeed,
    );
    const sampleSeconds = this.recorder.window.binSeconds / this.recorder.samplesPerBin;
    const queue = new EventQueue();
    this.model = new LineModel(line, streams, queue, this.recorder, {
      originSeconds: config.originSeconds ?? 0,
      endSeconds: config.endSeconds,
      firstSampleSeconds: config.warmupSeconds + sampleSeconds / 2,
      sampleSeconds,
      checkInvariants: config.checkInvariants ?? false,
    });
    this.state = this.model.state;
    this.loop = new EventLoop(this.state, this.model, {
      lastActiveKind: EV_LAST_ACTIVE,
      endKind: EV_END,
      eventBudget: config.eventBudget,
    });
  }

  get events(): number {
    return this.loop.events;
  }

  get done(): boolean {
    return this.loop.done;
  }

  /**
   * Runs events until the replication ends (returns true) or shouldYield, asked every 1024 events,
   * says to hand control back (returns false; call again to continue).
   */
  run(shouldYield: () => boolean): boolean {
    if (this.loop.done) return true;
    this.model.checkGridlock();
    const finished = this.loop.run(shouldYield);
    if (finished) this.recorder.finish();
    return finished;
  }
}
