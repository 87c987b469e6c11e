/**
 * Plain-language findings generated from the numbers of one constituent's mixing analysis,
 * never claiming more than the intervals allow.
 */
import type { ConstituentAnalysis, Estimate } from "../mixing/result.ts";
import { LOW_CONFIDENCE_CODES } from "../mixing/pitfalls.ts";
import { formatSignificant } from "../output/formatNumber.ts";
import {
  estimateInline,
  estimateText,
  fluxText,
  intervalCrossesZero,
  intervalText,
  unitSuffix,
} from "./estimateText.ts";
import { constituentWords, fractionInWords, multipleInWords } from "./wording.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** One finding sentence and how firmly the data support it. */
export interface Finding {
  constituent?: string;
  text: string;
  /** "clear": interval excludes no change; "uncertain": cannot be told from conservative mixing; "insufficient": too little data; "context": survey facts. */
  strength: "clear" | "uncertain" | "insufficient" | "context";
}

const cap = (s: string): string => s.charAt(0).toUpperCase() + s.slice(1);
const km0 = (x: number): string => formatSignificant(Math.round(x), 3);

/** Where: " between km 23 and km 9, where salinity rises from 0.9 to 12" (landward end first, as the water flows). */
export function zoneWhere(c: ConstituentAnalysis): string {
  const z = c.reactionZone;
  if (!z || !(z.salinity[1] - z.salinity[0] > 0.05)) return "";
  const s = ` where salinity rises from ${formatSignificant(z.salinity[0], 2)} to ${formatSignificant(z.salinity[1], 2)}`;
  const ends = z.km.flat();
  if (!ends.length)
    return ` at salinities ${formatSignificant(z.salinity[0], 2)} to ${formatSignificant(z.salinity[1], 2)}`;
  const land = maxOf(ends);
  const sea = minOf(ends);
  if (Math.round(land) === Math.round(sea)) return ` near km ${km0(land)},${s}`;
  const split =
    z.km.length > 1 ? " (in more than one stretch, as salinity does not rise steadily along the channel)" : "";
  return ` between km ${km0(land)} and km ${km0(sea)}${split},${s}`;
}

function netChangeSentence(c: ConstituentAnalysis, p: Estimate): Finding {
  const who = constituentWords(c.name);
  if (intervalCrossesZero(p))
    return {
      constituent: c.name,
      strength: "uncertain",
      text: `${cap(who)} departs from the dilution line, but its net change between river and sea, ${estimateText(p, 2, true)}, cannot be distinguished from conservative mixing.`,
    };
  const where = zoneWhere(c);
  if (p.value < 0) {
    const f = Math.min(1, -p.value / 100);
    return {
      constituent: c.name,
      strength: "clear",
      text: `${cap(fractionInWords(f))} of the ${who} brought by the river is removed${where} (net change ${estimateInline(p, 2, true)}).`,
    };
  }
  const m = 1 + p.value / 100;
  return {
    constituent: c.name,
    strength: "clear",
    text: `The estuary adds ${who}${where}: ${multipleInWords(m)} ${m < 1.9 ? "reaches the sea than" : "reaches the sea as"} the river brings (net change ${estimateInline(p, 2, true)}).`,
  };
}

/**
 * Findings of one constituent: its behaviour and net change with interval, where (km and
 * salinity), the mid-estuarine maximum, the flux at the survey's discharge and a low-confidence
 * note. When the % change interval includes zero the text says the change cannot be distinguished
 * from conservative mixing.
 *
 * @param c the constituent's mixing analysis
 * @returns findings in reading order (at least one)
 * @see Boyle et al. (1974) GCA 38, 1719–1728 (C*₀, % change, fluxes); Liss (1976) (dilution line).
 */
export function constituentFindings(c: ConstituentAnalysis): Finding[] {
  const who = constituentWords(c.name);
  if (c.class === "insufficient-data") {
    const why = c.warnings.find((w) => w.code === "insufficient-data")?.message;
    return [
      {
        constituent: c.name,
        strength: "insufficient",
        text: `${cap(who)}: too few usable data to judge its mixing behaviour${why ? ` (${why})` : ""}.`,
      },
    ];
  }
  const out: Finding[] = [];
  const p = c.percentChange;
  if (c.class === "conservative") {
    out.push({
      constituent: c.name,
      strength: "clear",
      text: `${cap(who)} mixes conservatively: the stations follow the dilution line within analytical precision${p ? ` (net change ${estimateInline(p, 2, true)})` : ""}.`,
    });
  } else if (p) out.push(netChangeSentence(c, p));
  else
    out.push({
      constituent: c.name,
      strength: "uncertain",
      text: `${cap(who)} departs from the dilution line (${c.class}), but no effective river end-member could be estimated.`,
    });
  const mx = c.maximum;
  if (mx) {
    const lo = Math.round(minOf(mx.km));
    const hi = Math.round(maxOf(mx.km));
    const kms = mx.km.length ? (lo === hi ? ` near km ${lo},` : ` near km ${lo}–${hi},`) : "";
    const ex = intervalCrossesZero(mx.excess)
      ? "an excess over the dilution line that cannot be distinguished from zero"
      : `${estimateText(mx.excess, 2)} above the dilution line`;
    out.push({
      constituent: c.name,
      strength: intervalCrossesZero(mx.excess) ? "uncertain" : "clear",
      text: `It peaks at salinity ${formatSignificant(mx.salinity.value, 2)} (95 % interval ${intervalText(mx.salinity, 2)}),${kms} ${ex}.`,
    });
  }
  const fx = c.flux;
  if (fx && c.class !== "conservative" && p && !intervalCrossesZero(p)) {
    const net = fx.netChange;
    const kind = net.value < 0 ? "sink" : "source";
    const [lo, hi] = net.value < 0 ? [-net.upper, -net.lower] : [net.lower, net.upper];
    out.push({
      constituent: c.name,
      strength: intervalCrossesZero(net) ? "uncertain" : "clear",
      text:
        `At a river discharge of ${formatSignificant(fx.dischargeM3s, 3)} m³/s the river carries ${fluxText(fx.grossRiver.value)} of ${c.name} and ` +
        `${fluxText(fx.effectiveExport.value)} passes to the sea: a net estuarine ${kind} of ` +
        `${fluxText(net.value).replace(/\)$/, `; 95 % interval ${formatSignificant(lo, 2)} to ${formatSignificant(hi, 2)} mol/s)`)}.`,
    });
  }
  if (c.effectiveEndmember && c.endmembers && c.class !== "conservative")
    out.push({
      constituent: c.name,
      strength: "context",
      text: `Effective river end-member C*₀ = ${estimateText(c.effectiveEndmember, 3)} against a river value of ${formatSignificant(c.endmembers.river.conc, 3)}${unitSuffix(c.unit)}.`,
    });
  const low = c.warnings.find((w) => LOW_CONFIDENCE_CODES.has(w.code));
  if (c.confidence === "low" && low)
    out.push({ constituent: c.name, strength: "uncertain", text: `Confidence is low: ${low.message}` });
  return out;
}
