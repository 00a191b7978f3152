package analysis

import (
	"context"
	"errors"

	"strutrisk/sim"
)

// noteMainFORM is the key of the study's FORM result in a shard's notes.
const noteMainFORM = "form/main"

// formNote is a FORM result, or its error, as a shard notes it: every
// float as its bit pattern, so that the merge reads back the result the
// shard computed.
type formNote struct {
	Beta        sim.Bits    `json:"beta"`
	Pf          sim.Bits    `json:"pf"`
	Points      []pointNote `json:"points"`
	Evaluations int         `json:"evaluations"`
	Converged   bool        `json:"converged"`
	Status      string      `json:"status"`
	// Err, when not empty, is the error of the search (no result).
	Err string `json:"error,omitempty"`
}

// pointNote is a design point of a formNote.
type pointNote struct {
	Beta       sim.Bits   `json:"beta"`
	U          []sim.Bits `json:"u"`
	X          []sim.Bits `json:"x"`
	Alpha      []sim.Bits `json:"alpha"`
	Importance []sim.Bits `json:"importance"`
}

func toBits(xs []float64) []sim.Bits {
	if xs == nil {
		return nil
	}
	out := make([]sim.Bits, len(xs))
	for i, x := range xs {
		out[i] = sim.Bits(x)
	}
	return out
}

func fromBits(bs []sim.Bits) []float64 {
	if bs == nil {
		return nil
	}
	out := make([]float64, len(bs))
	for i, b := range bs {
		out[i] = float64(b)
	}
	return out
}

// noteOfFORM is the note of a FORM search's outcome.
func noteOfFORM(f *sim.FORMResult, err error) *formNote {
	if err != nil {
		return &formNote{Err: err.Error()}
	}
	n := &formNote{Beta: sim.Bits(f.Beta), Pf: sim.Bits(f.Pf), Evaluations: f.Evaluations, Converged: f.Converged, Status: f.Status}
	for _, p := range f.Points {
		n.Points = append(n.Points, pointNote{Beta: sim.Bits(p.Beta), U: toBits(p.U), X: toBits(p.X), Alpha: toBits(p.Alpha), Importance: toBits(p.Importance)})
	}
	return n
}

// result is the FORM outcome n notes.
func (n *formNote) result() (*sim.FORMResult, error) {
	if n.Err != "" {
		return nil, errors.New(n.Err)
	}
	f := &sim.FORMResult{Beta: float64(n.Beta), Pf: float64(n.Pf), Evaluations: n.Evaluations, Converged: n.Converged, Status: n.Status}
	for _, p := range n.Points {
		f.Points = append(f.Points, sim.DesignPoint{Beta: float64(p.Beta), U: fromBits(p.U), X: fromBits(p.X), Alpha: fromBits(p.Alpha), Importance: fromBits(p.Importance)})
	}
	return f, nil
}

// studyFORM is the FORM search of the study of l with the settings of s.
// A merge takes the result a shard noted (RunShard) instead of searching
// again; a shard notes the result it finds.
func studyFORM(ctx context.Context, l *Loaded, s *sim.Settings) (*sim.FORMResult, error) {
	if s.Shard.Replays() {
		var n formNote
		if ok, err := s.Shard.Recall(noteMainFORM, &n); ok {
			if err != nil {
				return nil, err
			}
			return n.result()
		}
	}
	f, err := sim.FORMContext(ctx, l.Model.Sim, s.FORM)
	if s.Shard.Splits() && ctx.Err() == nil {
		if nerr := s.Shard.Note(noteMainFORM, noteOfFORM(f, err)); nerr != nil {
			return nil, nerr
		}
	}
	return f, err
}
