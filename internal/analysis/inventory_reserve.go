package analysis

import (
	"context"
	"fmt"
	"math"

	"strutrisk/internal/study"
	"strutrisk/sim"
)

// memberJumpTol is how far from the target the FORM index may be at the
// reserve factor a member's search returns: a root search ends within
// study.ReserveTol of it, so more means the index jumps across the target
// there (a design point found on one side only).
const memberJumpTol = 10 * study.ReserveTol

// memberReserve finds member md's reserve factor against target by FORM
// with settings fs (memberFORM), taking the FORM result of its estimate
// res when res's FORM was run with the same settings (own, those of the
// estimate's run); nil and a warning when there is none.
func memberReserve(ctx context.Context, md *study.Model, target float64, fs, own *sim.FORMSettings, res *sim.Result) (*float64, string) {
	fs = reserveFORM(fs, md)
	var at1 *sim.FORMResult
	if res.FORM != nil && res.Method != sim.Surrogate && sameFORM(fs, own) {
		at1 = res.FORM
	}
	rv, err := md.ReserveFactor(ctx, target, fs, at1)
	if err != nil {
		return nil, "no reserve factor: " + err.Error()
	}
	return memberFactor(rv)
}

// memberFactor is the factor of the search rv, or nil and a warning when
// the FORM index there is not the target.
func memberFactor(rv *study.Reserve) (*float64, string) {
	if math.Abs(rv.FactorBeta-rv.Target) > memberJumpTol {
		return nil, fmt.Sprintf("no reserve factor: the FORM index jumps across the target near a factor of %.4g (it is %.3f there, not %.2f)", rv.Factor, rv.FactorBeta, rv.Target)
	}
	f := rv.Factor
	return &f, ""
}

// reserveFORM are the FORM settings of a member's reserve search: fs
// searching every restart (Screen off) unless each evaluation of the
// member's model is a numerical analysis. Screened, the search from the
// origin of a member with two variable loads once ended at the least
// likely of its three design points and skipped the restarts that find
// the other two, below a factor of 0.70: the index jumped from 3.97 to
// 3.21 across the target 3.8 and the factor came out at 0.70 where the
// points found without screening give about 0.58. The restarts of a cheap
// model cost far less than combining the points.
func reserveFORM(fs *sim.FORMSettings, md *study.Model) *sim.FORMSettings {
	if fs == nil || !fs.Screen || md.Sim.Expensive {
		return fs
	}
	f := *fs
	f.Screen = false
	return &f
}

// sameFORM reports whether FORM runs with settings a and b give the same
// result: equal settings, nil being the defaults, Workers aside (the
// result is the same for any value).
func sameFORM(a, b *sim.FORMSettings) bool {
	var x, y sim.FORMSettings
	if a != nil {
		x = *a
	}
	if b != nil {
		y = *b
	}
	x.Workers, y.Workers = 0, 0
	return x == y
}
