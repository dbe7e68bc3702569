import { createRequire as __skillgateCreateRequire } from 'node:module';
const require = __skillgateCreateRequire(import.meta.url);

// src/parallel/resampleWorker.ts
import { parentPort, workerData } from "node:worker_threads";

// src/random/aliasTable.ts
function buildAliasTable(probabilities) {
  const size = probabilities.length;
  let sum = 0;
  for (let i = 0; i < size; i++) sum += probabilities[i];
  const scaled = new Float64Array(size);
  for (let i = 0; i < size; i++) scaled[i] = probabilities[i] * size / sum;
  const threshold = new Float64Array(size);
  const alias = new Int32Array(size);
  const small = [];
  const large = [];
  for (let i = size - 1; i >= 0; i--) (scaled[i] < 1 ? small : large).push(i);
  while (small.length > 0 && large.length > 0) {
    const less = small.pop();
    const more = large.pop();
    threshold[less] = scaled[less];
    alias[less] = more;
    scaled[more] = scaled[more] + scaled[less] - 1;
    (scaled[more] < 1 ? small : large).push(more);
  }
  for (const i of large) {
    threshold[i] = 1;
    alias[i] = i;
  }
  for (const i of small) {
    threshold[i] = 1;
    alias[i] = i;
  }
  return { threshold, alias };
}

// src/random/geometricSampler.ts
var MAX_COLUMNS_LOG2 = 12;
var OVERFLOW_PROBABILITY = 1 / 1024;
function createGeometricSampler(mean) {
  if (!(Number.isFinite(mean) && mean >= 1)) {
    throw new RangeError(`the mean of a geometric length must be a finite number \u2265 1, got ${mean}`);
  }
  if (mean === 1) {
    const table = { threshold: Float64Array.of(1, 0), alias: Int32Array.of(0, 0) };
    return { mean, truncation: 1, table, inline: null, sample: () => 1 };
  }
  const p = 1 / mean;
  const q = 1 - p;
  let bits = 1;
  while (bits < MAX_COLUMNS_LOG2 && q ** (2 ** bits - 1) > OVERFLOW_PROBABILITY) bits++;
  const columns = 2 ** bits;
  const truncation = columns - 1;
  const probabilities = new Float64Array(columns);
  for (let k = 1; k <= truncation; k++) probabilities[k - 1] = p * q ** (k - 1);
  probabilities[truncation] = q ** truncation;
  const { threshold, alias } = buildAliasTable(probabilities);
  const shift = 32 - bits;
  const coinMask = 2 ** shift - 1;
  const coinScale = 2 ** shift;
  const edge = new Float64Array(columns);
  const edgeFraction = new Float64Array(columns);
  for (let i = 0; i < columns; i++) {
    const scaled = threshold[i] * coinScale;
    edge[i] = Math.floor(scaled);
    edgeFraction[i] = scaled - edge[i];
  }
  const overflow = truncation;
  return {
    mean,
    truncation,
    table: { threshold, alias },
    inline: { shift, coinMask, edge, edgeFraction, alias, truncation },
    sample(random, cap) {
      let total = 0;
      for (; ; ) {
        const x = random.nextUint32();
        const column = x >>> shift;
        const coin = x & coinMask;
        const cut = edge[column];
        const keep = coin !== cut ? coin < cut : random.nextDouble() < edgeFraction[column];
        const outcome = keep ? column : alias[column];
        if (outcome !== overflow) {
          total += outcome + 1;
          return Math.min(total, cap);
        }
        total += truncation;
        if (total >= cap) return cap;
      }
    }
  };
}

// node_modules/pure-rand/lib/esm/generator/xoroshiro128plus.js
var jumps = [
  3639956645,
  3750757012,
  1261568508,
  386426335
];
var XoroShiro128Plus = class XoroShiro128Plus2 {
  constructor(s01, s00, s11, s10) {
    this.s01 = s01;
    this.s00 = s00;
    this.s11 = s11;
    this.s10 = s10;
  }
  clone() {
    return new XoroShiro128Plus2(this.s01, this.s00, this.s11, this.s10);
  }
  next() {
    const out = this.s00 + this.s10 | 0;
    const a0 = this.s10 ^ this.s00;
    const a1 = this.s11 ^ this.s01;
    const s00 = this.s00;
    const s01 = this.s01;
    this.s00 = s00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
    this.s01 = s01 << 24 ^ s00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
    this.s10 = a1 << 5 ^ a0 >>> 27;
    this.s11 = a0 << 5 ^ a1 >>> 27;
    return out;
  }
  jump() {
    let ns01 = 0;
    let ns00 = 0;
    let ns11 = 0;
    let ns10 = 0;
    let s01 = this.s01;
    let s00 = this.s00;
    let s11 = this.s11;
    let s10 = this.s10;
    for (let i = 0; i !== 4; ++i) {
      const ji = jumps[i];
      for (let mask = 1; mask; mask <<= 1) {
        if (ji & mask) {
          ns01 ^= s01;
          ns00 ^= s00;
          ns11 ^= s11;
          ns10 ^= s10;
        }
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const s00_ = s00;
        const s01_ = s01;
        s00 = s00_ << 24 ^ s01_ >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01_ << 24 ^ s00_ >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
    }
    this.s01 = ns01;
    this.s00 = ns00;
    this.s11 = ns11;
    this.s10 = ns10;
  }
  getState() {
    return [
      this.s01,
      this.s00,
      this.s11,
      this.s10
    ];
  }
};
function xoroshiro128plusFromState(state) {
  if (!(state.length === 4)) throw new Error("The state must have been produced by a xoroshiro128plus RandomGenerator");
  return new XoroShiro128Plus(state[0], state[1], state[2], state[3]);
}

// src/random/splitMix64.ts
var MASK_64 = (1n << 64n) - 1n;
var GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;
function splitMix64Words(seed, count) {
  let state = BigInt(seed) & MASK_64;
  const words = [];
  for (let i = 0; i < count; i++) {
    state = state + GOLDEN_GAMMA & MASK_64;
    let z = state;
    z = (z ^ z >> 30n) * 0xbf58476d1ce4e5b9n & MASK_64;
    z = (z ^ z >> 27n) * 0x94d049bb133111ebn & MASK_64;
    z = z ^ z >> 31n;
    words.push(Number(BigInt.asIntN(32, z >> 32n)), Number(BigInt.asIntN(32, z)));
  }
  return words;
}

// src/random/randomSource.ts
var TWO_POW_26 = 67108864;
var TWO_POW_MINUS_53 = 1 / 9007199254740992;
function createRandomSource(seed, stream = 0) {
  return createRandomStreams(seed, stream).next();
}
createRandomSource.sequence = createRandomStreams;
function createRandomStreams(seed, first = 0) {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be an integer between 0 and 2^53 \u2212 1, got ${seed}`);
  }
  if (!Number.isSafeInteger(first) || first < 0) {
    throw new RangeError(`stream must be a non-negative integer, got ${first}`);
  }
  const [s0High, s0Low, s1High, s1Low] = splitMix64Words(seed, 2);
  const cursor = xoroshiro128plusFromState([s0High, s0Low, s1High, s1Low]);
  for (let k = 0; k < first; k++) cursor.jump();
  let started = false;
  return {
    next: () => {
      if (started) cursor.jump();
      started = true;
      return sourceOf(cursor.clone());
    }
  };
}
var TWO_POW_32 = 4294967296;
var Xoroshiro128PlusSource = class {
  s01;
  s00;
  s11;
  s10;
  pending = 0;
  hasPending = false;
  constructor(state) {
    this.s01 = state[0] | 0;
    this.s00 = state[1] | 0;
    this.s11 = state[2] | 0;
    this.s10 = state[3] | 0;
  }
  nextUint32() {
    if (this.hasPending) {
      this.hasPending = false;
      return this.pending >>> 0;
    }
    const s00 = this.s00;
    const s01 = this.s01;
    const s10 = this.s10;
    const s11 = this.s11;
    const low = (s00 >>> 0) + (s10 >>> 0);
    const carry = low >= TWO_POW_32 ? 1 : 0;
    this.pending = low | 0;
    this.hasPending = true;
    const high = s01 + s11 + carry >>> 0;
    const a0 = s10 ^ s00;
    const a1 = s11 ^ s01;
    this.s00 = s00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
    this.s01 = s01 << 24 ^ s00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
    this.s10 = a1 << 5 ^ a0 >>> 27;
    this.s11 = a0 << 5 ^ a1 >>> 27;
    return high;
  }
  nextDouble() {
    const a = this.nextUint32() >>> 5;
    const b = this.nextUint32() >>> 6;
    return (a * TWO_POW_26 + b) * TWO_POW_MINUS_53;
  }
};
function sourceOf(generator) {
  return new Xoroshiro128PlusSource(generator.getState());
}

// src/statistics/bootstrap/resampleDeviationsInline.ts
var TWO_POW_322 = 4294967296;
var TWO_POW_MINUS_32 = 1 / TWO_POW_322;
var LEMIRE_LIMIT = 2097152;
function resampleDeviationsInline(prefix, n, sampler, source, count) {
  if (sampler.inline === null) return unitBlocks(prefix, n, source, count);
  return geometricBlocks(prefix, n, sampler, source, count);
}
function unitBlocks(prefix, n, source, count) {
  const P32 = 4294967296;
  const INV32 = 1 / 4294967296;
  const out = new Float64Array(count);
  const lemire = n <= LEMIRE_LIMIT;
  const threshold = P32 % n;
  const maskShift = Math.clz32(n - 1);
  let s00 = source.s00;
  let s01 = source.s01;
  let s10 = source.s10;
  let s11 = source.s11;
  let pend = source.pending;
  let has = source.hasPending;
  const step = new Float64Array(n);
  for (let s = 0; s < n; s++) step[s] = prefix[s + 1] - prefix[s];
  for (let r = 0; r < count; r++) {
    let filled = 0;
    let sum = 0;
    while (filled < n) {
      if (lemire && !has) {
        const stop = n - 1;
        let rejected = false;
        while (filled < stop) {
          const lo = (s00 >>> 0) + (s10 >>> 0);
          const c = lo >= P32 ? 1 : 0;
          const low = lo | 0;
          const high = s01 + s11 + c >>> 0;
          const a0 = s10 ^ s00;
          const a1 = s11 ^ s01;
          const t00 = s00;
          s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
          s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
          s10 = a1 << 5 ^ a0 >>> 27;
          s11 = a0 << 5 ^ a1 >>> 27;
          const m1 = high * n;
          const first = Math.floor(m1 * INV32);
          if (m1 - first * P32 < threshold) {
            pend = low;
            has = true;
            rejected = true;
            break;
          }
          sum += step[first];
          filled++;
          const m2 = (low >>> 0) * n;
          const second = Math.floor(m2 * INV32);
          if (m2 - second * P32 < threshold) {
            rejected = true;
            break;
          }
          sum += step[second];
          filled++;
        }
        if (rejected) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          sum += step[rejectedStart(source, n, threshold)];
          filled++;
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
          continue;
        }
        if (filled >= n) break;
      }
      let x;
      if (has) {
        x = pend >>> 0;
        has = false;
      } else {
        const lo = (s00 >>> 0) + (s10 >>> 0);
        const c = lo >= P32 ? 1 : 0;
        pend = lo | 0;
        has = true;
        x = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      let start;
      if (lemire) {
        const m = x * n;
        start = Math.floor(m * INV32);
        if (m - start * P32 < threshold) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = rejectedStart(source, n, threshold);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      } else {
        start = maskShift === 0 ? x : x >>> maskShift;
        if (start >= n) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = bitmaskStart(source, n, maskShift);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      }
      sum += step[start];
      filled++;
    }
    out[r] = sum / n;
  }
  source.s00 = s00;
  source.s01 = s01;
  source.s10 = s10;
  source.s11 = s11;
  source.pending = pend;
  source.hasPending = has;
  return out;
}
function geometricBlocks(prefix, n, sampler, source, count) {
  const P32 = 4294967296;
  const INV32 = 1 / 4294967296;
  const out = new Float64Array(count);
  const inline = sampler.inline;
  const lemire = n <= LEMIRE_LIMIT;
  const threshold = P32 % n;
  const maskShift = Math.clz32(n - 1);
  let s00 = source.s00;
  let s01 = source.s01;
  let s10 = source.s10;
  let s11 = source.s11;
  let pend = source.pending;
  let has = source.hasPending;
  const { shift, coinMask, edge, alias, truncation } = inline;
  const starts = new Int32Array(n);
  const lengths = new Int32Array(n);
  for (let r = 0; r < count; r++) {
    let filled = 0;
    let blocks = 0;
    while (filled < n) {
      let x;
      if (has) {
        x = pend >>> 0;
        has = false;
      } else {
        const lo = (s00 >>> 0) + (s10 >>> 0);
        const c = lo >= P32 ? 1 : 0;
        pend = lo | 0;
        has = true;
        x = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      let start;
      if (lemire) {
        const m = x * n;
        start = Math.floor(m * INV32);
        if (m - start * P32 < threshold) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = rejectedStart(source, n, threshold);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      } else {
        start = maskShift === 0 ? x : x >>> maskShift;
        if (start >= n) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = bitmaskStart(source, n, maskShift);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      }
      let y;
      if (has) {
        y = pend >>> 0;
        has = false;
      } else {
        const lo = (s00 >>> 0) + (s10 >>> 0);
        const c = lo >= P32 ? 1 : 0;
        pend = lo | 0;
        has = true;
        y = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      const column = y >>> shift;
      const coin = y & coinMask;
      const cut = edge[column];
      let length;
      if (coin !== cut) {
        const outcome = coin < cut ? column : alias[column];
        length = outcome !== truncation ? outcome + 1 : -1;
      } else {
        length = -1;
      }
      const left = n - filled;
      if (length < 0) {
        source.s00 = s00;
        source.s01 = s01;
        source.s10 = s10;
        source.s11 = s11;
        source.pending = pend;
        source.hasPending = has;
        length = finishLength(source, sampler, column, coin, cut, left);
        s00 = source.s00;
        s01 = source.s01;
        s10 = source.s10;
        s11 = source.s11;
        pend = source.pending;
        has = source.hasPending;
      } else if (length > left) {
        length = left;
      }
      starts[blocks] = start;
      lengths[blocks] = length;
      blocks++;
      filled += length;
    }
    let sum = 0;
    for (let i = 0; i < blocks; i++) {
      const s = starts[i];
      sum += prefix[s + lengths[i]] - prefix[s];
    }
    out[r] = sum / n;
  }
  source.s00 = s00;
  source.s01 = s01;
  source.s10 = s10;
  source.s11 = s11;
  source.pending = pend;
  source.hasPending = has;
  return out;
}
function rejectedStart(source, n, threshold) {
  for (; ; ) {
    const m = source.nextUint32() * n;
    const high = Math.floor(m * TWO_POW_MINUS_32);
    if (m - high * TWO_POW_322 >= threshold) return high;
  }
}
function bitmaskStart(source, n, maskShift) {
  for (; ; ) {
    const x = source.nextUint32();
    const candidate = maskShift === 0 ? x : x >>> maskShift;
    if (candidate < n) return candidate;
  }
}
function finishLength(source, sampler, column, coin, cut, cap) {
  const { edgeFraction, alias, truncation } = sampler.inline;
  const keep = coin !== cut ? coin < cut : source.nextDouble() < edgeFraction[column];
  const outcome = keep ? column : alias[column];
  if (outcome !== truncation) return Math.min(outcome + 1, cap);
  if (truncation >= cap) return cap;
  return truncation + sampler.sample(source, cap - truncation);
}

// src/statistics/bootstrap/resampleMeanDeviation.ts
function resampleMeanDeviation(prefix, n, blocks) {
  const { starts, lengths, count } = blocks;
  let sum = 0;
  for (let i = 0; i < count; i++) {
    const s = starts[i];
    sum += prefix[s + lengths[i]] - prefix[s];
  }
  return sum / n;
}

// src/random/uniformIndex.ts
var TWO_POW_323 = 4294967296;
var LEMIRE_LIMIT2 = 2097152;
function uniformIndex(random, n) {
  if (n <= 1) return 0;
  if (n <= LEMIRE_LIMIT2) {
    let m = random.nextUint32() * n;
    let high = Math.floor(m / TWO_POW_323);
    let low = m - high * TWO_POW_323;
    if (low < n) {
      const threshold = TWO_POW_323 % n;
      while (low < threshold) {
        m = random.nextUint32() * n;
        high = Math.floor(m / TWO_POW_323);
        low = m - high * TWO_POW_323;
      }
    }
    return high;
  }
  const shift = Math.clz32(n - 1);
  for (; ; ) {
    const candidate = shift === 0 ? random.nextUint32() : random.nextUint32() >>> shift;
    if (candidate < n) return candidate;
  }
}

// src/statistics/bootstrap/stationaryBlocks.ts
function allocateStationaryBlocks(n) {
  return { starts: new Int32Array(n), lengths: new Int32Array(n), count: 0 };
}
function drawStationaryBlocks(n, sampler, random, into = allocateStationaryBlocks(n)) {
  const { starts, lengths } = into;
  let filled = 0;
  let count = 0;
  while (filled < n) {
    starts[count] = uniformIndex(random, n);
    const length = sampler.sample(random, n - filled);
    lengths[count] = length;
    filled += length;
    count++;
  }
  into.count = count;
  return into;
}

// src/statistics/bootstrap/resampleJob.ts
var RESAMPLES_PER_STREAM = 256;
function streamCount(resamples) {
  return Math.ceil(resamples / RESAMPLES_PER_STREAM);
}
function streamShare(resamples, stream) {
  const first = stream * RESAMPLES_PER_STREAM;
  return { first, count: Math.max(0, Math.min(RESAMPLES_PER_STREAM, resamples - first)) };
}
function resampleDeviationsOfStream(prefix, n, sampler, random, count) {
  if (random instanceof Xoroshiro128PlusSource && n >= 2) {
    return resampleDeviationsInline(prefix, n, sampler, random, count);
  }
  return resampleDeviationsGeneric(prefix, n, sampler, random, count);
}
function resampleDeviationsGeneric(prefix, n, sampler, random, count) {
  const out = new Float64Array(count);
  const blocks = allocateStationaryBlocks(n);
  for (let b = 0; b < count; b++) {
    drawStationaryBlocks(n, sampler, random, blocks);
    out[b] = resampleMeanDeviation(prefix, n, blocks);
  }
  return out;
}

// src/parallel/sharedResampleTask.ts
var NEXT_STREAM = 0;
var FINISHED_STREAMS = 1;
var FAILED = 2;
function workOnSharedTask(task, reportFailure = () => {
}) {
  const control = new Int32Array(task.control);
  const prefix = new Float64Array(task.prefix);
  const out = new Float64Array(task.out);
  const total = streamCount(task.resamples);
  let sampler = null;
  let streams = null;
  let nextIndex = 0;
  let done = 0;
  for (; ; ) {
    const stream = Atomics.add(control, NEXT_STREAM, 1);
    if (stream >= total) return done;
    try {
      sampler ??= createGeometricSampler(task.expectedBlockLength);
      if (streams === null) {
        streams = createRandomStreams(task.seed, stream);
        nextIndex = stream;
      }
      for (; nextIndex < stream; nextIndex++) streams.next();
      const source = streams.next();
      nextIndex++;
      const { first, count } = streamShare(task.resamples, stream);
      out.set(resampleDeviationsOfStream(prefix, task.n, sampler, source, count), first);
      done++;
    } catch (error) {
      reportFailure(error instanceof Error ? error.message : String(error));
      Atomics.store(control, FAILED, 1);
      throw error;
    } finally {
      Atomics.add(control, FINISHED_STREAMS, 1);
      Atomics.notify(control, FINISHED_STREAMS);
    }
  }
}

// src/parallel/resampleWorker.ts
var failures = workerData.failures;
parentPort?.on("message", (task) => {
  try {
    workOnSharedTask(task, (message) => failures.postMessage(message));
  } catch {
  }
});
