package sim

import (
	"crypto/sha256"
	"encoding/binary"
	"encoding/hex"
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"slices"
	"strings"
	"sync"
)

// ErrNotShardable is returned by Run in shard mode for a method whose plan
// depends on its earlier results.
var ErrNotShardable = errors.New("only monte-carlo, latin-hypercube and conditional-qmc can be split into shards: the plan of the other methods depends on their earlier results")

// Shard splits crude and Latin hypercube sampling (and conditional QMC:
// conditional_shard.go) across machines. The
// blocks of a run are partitioned: block 0, which fixes the histogram
// ranges, is evaluated by every shard; block b >= 1 belongs to shard
// b mod Count. A shard records its blocks; a later Run given the union of
// every shard's records (Count 0) takes the blocks from them instead of
// evaluating them and so returns, bit for bit, what a single Run returns.
// Runs are told apart by a key: a hash of the method, seed, budget and
// the results of block 0, so a run of another model or study finds no
// record and is evaluated in full.
type Shard struct {
	// Index and Count: with Count > 0, Run evaluates only this shard's
	// blocks (the whole budget's, ignoring TargetCoV) and records them;
	// with Count 0, Run replays recorded blocks.
	Index, Count int

	mu    sync.Mutex
	runs  map[string]*ShardRun
	notes map[string]json.RawMessage // of the caller's steps (shard_notes.go)
}

// ShardRun is the recorded blocks of one sampling run.
type ShardRun struct {
	Key    string       `json:"key"`
	Blocks int          `json:"blocks"` // of the whole run
	Done   []ShardBlock `json:"done"`   // this shard's, in block order
}

// ShardBlock is the outcome of one block, kept exactly.
type ShardBlock struct {
	Index int          `json:"index"`
	N     int64        `json:"n"`
	Fails int64        `json:"fails"`
	Stats []ShardStats `json:"stats"` // per output, then g
	// Kept are the kept sample rows of the block, if any.
	Kept [][]Bits `json:"kept,omitempty"`
}

// ShardStats are the sums of one output over one block. Fine is the
// sparse fine histogram: pairs of bin index and count.
type ShardStats struct {
	N     int64   `json:"n"`
	NaN   int64   `json:"nan"`
	S1    Bits    `json:"s1"`
	S2    Bits    `json:"s2"`
	Min   Bits    `json:"min"`
	Max   Bits    `json:"max"`
	Under Bits    `json:"under"`
	Over  Bits    `json:"over"`
	Fine  []int64 `json:"fine"`
}

// Bits is a float64 written in JSON as its IEEE 754 bit pattern (an
// unsigned integer), so that it reads back exactly, infinities and NaN
// included.
type Bits float64

// MarshalJSON writes the bit pattern of b.
func (b Bits) MarshalJSON() ([]byte, error) {
	return json.Marshal(math.Float64bits(float64(b)))
}

// UnmarshalJSON reads a bit pattern.
func (b *Bits) UnmarshalJSON(p []byte) error {
	var u uint64
	if err := json.Unmarshal(p, &u); err != nil {
		return err
	}
	*b = Bits(math.Float64frombits(u))
	return nil
}

// NewReplay returns a Shard that replays the given runs (Count 0). Every
// run must hold each of its blocks 1..Blocks-1 exactly once, in order.
func NewReplay(runs []*ShardRun) (*Shard, error) {
	s := &Shard{runs: map[string]*ShardRun{}}
	for _, r := range runs {
		if _, ok := s.runs[r.Key]; ok {
			return nil, fmt.Errorf("sim: run %s is given twice", r.Key)
		}
		if len(r.Done) != r.Blocks-1 {
			return nil, fmt.Errorf("sim: run %s has %d of its %d blocks after the first", r.Key, len(r.Done), r.Blocks-1)
		}
		for i, b := range r.Done {
			if b.Index != i+1 {
				return nil, fmt.Errorf("sim: run %s: block %d is missing or given twice", r.Key, i+1)
			}
		}
		s.runs[r.Key] = r
	}
	return s, nil
}

// Runs returns the runs recorded by a shard, in the order they ran.
func (s *Shard) Runs() []*ShardRun {
	s.mu.Lock()
	defer s.mu.Unlock()
	out := make([]*ShardRun, 0, len(s.runs))
	for _, r := range s.runs {
		out = append(out, r)
	}
	sortRuns(out)
	return out
}

func sortRuns(rs []*ShardRun) {
	slices.SortFunc(rs, func(a, b *ShardRun) int { return strings.Compare(a.Key, b.Key) })
}

// owns reports whether block b >= 1 is this shard's.
func (s *Shard) owns(b int) bool { return b%s.Count == s.Index }

// record stores run r (replacing one of the same key: a run repeated
// within one process gives the same blocks).
func (s *Shard) record(r *ShardRun) {
	s.mu.Lock()
	defer s.mu.Unlock()
	if s.runs == nil {
		s.runs = map[string]*ShardRun{}
	}
	s.runs[r.Key] = r
}

// lookup returns the recorded run of key, or nil.
func (s *Shard) lookup(key string) *ShardRun {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.runs[key]
}

// shardKey identifies a sampling run by its method, seed, stream, budget
// and the results of its block 0.
func (e *crudeEngine) shardKey(method Method, blk0 *crudeBlock) string {
	h := sha256.New()
	put := func(u uint64) { h.Write(binary.LittleEndian.AppendUint64(nil, u)) }
	h.Write([]byte(method))
	put(e.seed)
	put(e.stream)
	put(uint64(e.n))
	put(uint64(e.nvar))
	put(uint64(e.nout))
	put(uint64(blk0.fails))
	for k, st := range blk0.stats {
		l := e.layouts[k]
		for _, f := range []float64{l.shift, l.lo, l.width, st.s1, st.s2, st.min, st.max} {
			put(math.Float64bits(f))
		}
		put(uint64(st.nan))
	}
	return hex.EncodeToString(h.Sum(nil)[:16])
}

// toShard copies blk, with its kept rows, into a record.
func (e *crudeEngine) toShard(blk *crudeBlock) ShardBlock {
	sb := ShardBlock{Index: blk.b, N: blk.n, Fails: blk.fails, Stats: make([]ShardStats, len(blk.stats))}
	for k, st := range blk.stats {
		ss := ShardStats{N: st.n, NaN: st.nan, S1: Bits(st.s1), S2: Bits(st.s2), Min: Bits(st.min), Max: Bits(st.max), Under: Bits(st.fUnder), Over: Bits(st.fOver)}
		for i, c := range st.fine {
			if c != 0 {
				ss.Fine = append(ss.Fine, int64(i), int64(c)) // counts are whole numbers below 2^53
			}
		}
		sb.Stats[k] = ss
	}
	start, size := blockRange(blk.b, e.n)
	for i := start; i < start+int64(size) && i < int64(len(e.kept)); i++ {
		row := make([]Bits, len(e.kept[i]))
		for j, v := range e.kept[i] {
			row[j] = Bits(v)
		}
		sb.Kept = append(sb.Kept, row)
	}
	return sb
}

// fromShard fills blk, and the kept rows, from a record.
func (e *crudeEngine) fromShard(sb *ShardBlock, blk *crudeBlock) error {
	if len(sb.Stats) != len(blk.stats) {
		return fmt.Errorf("sim: recorded block %d has %d outputs, the run %d", sb.Index, len(sb.Stats), len(blk.stats))
	}
	blk.b, blk.n, blk.fails = sb.Index, sb.N, sb.Fails
	for k, ss := range sb.Stats {
		st := blk.stats[k]
		st.reset()
		st.n, st.nan, st.s1, st.s2 = ss.N, ss.NaN, float64(ss.S1), float64(ss.S2)
		st.min, st.max, st.fUnder, st.fOver = float64(ss.Min), float64(ss.Max), float64(ss.Under), float64(ss.Over)
		for i := 0; i+1 < len(ss.Fine); i += 2 {
			if ss.Fine[i] < 0 || ss.Fine[i] >= fineBins {
				return fmt.Errorf("sim: recorded block %d: fine bin %d out of range", sb.Index, ss.Fine[i])
			}
			st.fine[ss.Fine[i]] = float64(ss.Fine[i+1])
		}
	}
	start, _ := blockRange(sb.Index, e.n)
	for i, row := range sb.Kept {
		idx := start + int64(i)
		if idx >= int64(len(e.kept)) || len(row) != len(e.kept[idx]) {
			return fmt.Errorf("sim: recorded block %d: kept rows do not fit the run", sb.Index)
		}
		for j, v := range row {
			e.kept[idx][j] = float64(v)
		}
	}
	return nil
}

// CombineRuns joins the runs recorded by each of the count shards of a
// split run: a run recorded by every shard becomes one run with all its
// blocks in order. Runs that not every shard made (their plan followed a
// shard's own partial result) are left out: a replay evaluates them.
func CombineRuns(shards [][]*ShardRun) []*ShardRun {
	byKey := map[string]*ShardRun{}
	seen := map[string]int{}
	for _, runs := range shards {
		for _, r := range runs {
			c, ok := byKey[r.Key]
			if !ok {
				c = &ShardRun{Key: r.Key, Blocks: r.Blocks}
				byKey[r.Key] = c
			}
			c.Done = append(c.Done, r.Done...)
			seen[r.Key]++
		}
	}
	out := make([]*ShardRun, 0, len(byKey))
	for k, c := range byKey {
		if seen[k] != len(shards) {
			continue
		}
		sortBlocks(c.Done)
		out = append(out, c)
	}
	sortRuns(out)
	return out
}

func sortBlocks(bs []ShardBlock) {
	slices.SortFunc(bs, func(a, b ShardBlock) int { return a.Index - b.Index })
}
