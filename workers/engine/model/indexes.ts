// Branded index types for the line model's flat arrays: a carrier, station, lane, step or connection
// number is a plain number at run time, but the compiler keeps them apart, so passing a station where
// a carrier is due (or swapping two arguments) fails to compile. Arrays that hold indexes say which
// kind they hold, so reading one gives the right brand. Numbers become indexes only at the edges:
// compiling the line, loops over every entity, and event payloads.
declare const brand: unique symbol;
type Index<Kind extends string> = number & { readonly [brand]: Kind };

export type CarrierIndex = Index<'carrier'>;
export type StationIndex = Index<'station'>;
export type LaneIndex = Index<'lane'>;
export type StepIndex = Index<'step'>;
export type ConnIndex = Index<'connection'>;

/** An Int32Array whose entries are indexes of one kind (-1 where there is none). */
export interface IndexArray<T extends number> extends Int32Array {
  [index: number]: T;
}

/** The "none" entry of an index array. */
export const NONE = -1 as CarrierIndex & StationIndex & LaneIndex & StepIndex & ConnIndex;

export const indexArray = <T extends number>(length: number, fill: number = NONE) =>
  new Int32Array(length).fill(fill) as IndexArray<T>;
export const asIndexArray = <T extends number>(a: Int32Array) => a as IndexArray<T>;
