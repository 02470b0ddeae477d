/** Number formatting for the checks' sentences (engineering prefixes only at this edge). */
import { formatEngineering } from '../units/engineering.ts';

export const eng = (x: number, unit: string): string => formatEngineering(x, unit, 3);
export const pct = (x: number): string => `${Number((x * 100).toPrecision(3))} %`;
export const plain = (x: number): string => Number(x.toPrecision(3)).toString();
