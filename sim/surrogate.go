package sim

import (
	"context"
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// streamSurrogate is the random stream of the surrogate's candidates.
const streamSurrogate uint64 = 0x4b

// surrogate estimates pf by active-learning Kriging on a population of
// candidates (AK-MCS: B. Echard, N. Gayton and M. Lemaire, "AK-MCS: an
// active learning reliability method combining Kriging and Monte Carlo
// simulation", Structural Safety 33(2), 2011, 145-154), drawn around the
// FORM design points as in AK-IS (B. Echard, N. Gayton, M. Lemaire and
// N. Relun, "A combined importance sampling and Kriging reliability
// method for small failure probabilities with time-demanding computer
// models", Reliability Engineering and System Safety 111, 2013, 232-240).
//
// FORM runs first (further design points searched only where one is
// likely, FORMSettings.Screen) and every point it evaluates trains the Kriging model of g in standard
// normal space (kriging.go). The candidates are drawn from the importance
// density of importance sampling around the design points (from the
// standard normal itself when FORM fails: AK-MCS proper), in blocks of
// Surrogate.Population. Then, one model evaluation at a time, the
// candidate with the least U = |mu|/sigma (the learning function of
// AK-MCS: the number of predictive standard deviations between the
// predicted g and 0) is evaluated and added, until min U >= 2 (a sign
// wrong with probability below Phi(-2) = 0.023 at the worst candidate).
// If the CoV of pf on the candidates is then above the target, a further
// block of candidates is drawn (up to Surrogate.MaxPopulation) and the
// learning goes on. The model evaluations, FORM's included, are bounded
// by Settings.Samples (FORM itself is not cut short: a budget below what
// FORM needs ends the learning at once), and those the learning adds by
// Surrogate.MaxLearning: each is followed by a refit and by predictions
// that cost the square of the training points per candidate, and a limit
// state the model cannot settle on (candidates closer to g = 0 than the
// nugget's floor under the predictive spread, which only evaluating each
// of them decides) would otherwise run on for hours. A budget or a cap
// that ends before the model settles leaves the result Unsettled, not
// trusted: the interval would rest on the Kriging model's own predictive
// spread alone.
//
// The estimate counts the candidates the mean predicts failed, weighted
// as in importance sampling. Its error has two parts, both in PfCoV and
// PfCI: the sampling error of the candidates (the variance of the
// weighted indicator) and the surrogate's, treating each candidate's sign
// as wrong with probability Phi(-U) independently (variance sum w^2 p (1 -
// p) / N^2). The interval runs from the lower end of the sampling
// interval of pf-, counting the candidates with mu + z sigma < 0, to the
// upper end of that of pf+, counting those with mu - z sigma < 0 (the
// bounds of Dubourg, Sudret and Deheeger, Probabilistic Engineering
// Mechanics 33, 2013, from memory), z of Settings.Confidence. Candidates,
// weights and the model are the same for any number of workers.
func surrogate(ctx context.Context, m *Model, t *Transform, s *Settings) (*Result, error) {
	cfg := rareDefaults(s)
	ss := cfg.surrogate()
	sp := modelSpace(m, t)
	rec := &recordSpace{dim: sp.dim}
	res := &Result{Method: Surrogate, Confidence: cfg.Confidence}
	tr := newTracer(&cfg, res)
	tr.report(Progress{Phase: "FORM"})
	form := formRunRecorded(ctx, sp, surrogateFORM(cfg.formFor(m)), rec.add)
	for i := range form.Points {
		p := &form.Points[i]
		p.X = make([]float64, t.Dim())
		t.ToX(p.X, p.U)
	}
	res.FORM = form
	if ctx.Err() != nil {
		r := interruptedResult(Surrogate, int64(rec.evals()))
		r.FORM = form
		return r, nil
	}
	a := &akRun{ctx: ctx, cfg: &cfg, ss: ss, g: sp.newG(), dim: sp.dim, res: res, tr: tr,
		k: newKriging(sp.dim), z: distuv.UnitNormal.Quantile(0.5 + cfg.Confidence/2)}
	a.evals = rec.evals()
	a.stop = min(int(cfg.Samples), a.evals+ss.MaxLearning)
	a.mixture(form, a.target())
	a.train(rec)
	if err := a.learn(); err != nil {
		return nil, err
	}
	return res, nil
}

// surrogateFORM returns the FORM settings of the surrogate: those given,
// with further design points searched only where one is likely
// (FORMSettings.Screen).
func surrogateFORM(f *FORMSettings) *FORMSettings {
	c := formSettings(f)
	c.Screen = true
	return &c
}

// recordSpace keeps the points FORM evaluates and their g, in order.
type recordSpace struct {
	dim int
	u   []float64 // row-major
	gv  []float64
}

func (r *recordSpace) add(u []float64, g float64) {
	r.u = append(r.u, u...)
	r.gv = append(r.gv, g)
}

func (r *recordSpace) evals() int { return len(r.gv) }

// Surrogate defaults.
const (
	DefaultSurrogatePopulation    = 10000
	DefaultSurrogateMaxPopulation = 200000
	// DefaultSurrogateMaxLearning is the default of
	// SurrogateSettings.MaxLearning: published active-learning Kriging
	// examples of up to some ten inputs settle within a few hundred
	// evaluations (Echard, Gayton and Lemaire 2011: 126 for the
	// four-branch system; from memory); of the demos, the store's two
	// loads settled after 460 and the measured retrofit after 312, and a
	// Kriging model of 600 points beyond FORM's takes a second or two
	// per step.
	DefaultSurrogateMaxLearning = 600
	// surrogateU is the learning threshold of AK-MCS: min U >= 2.
	surrogateU = 2.0
	// surrogateMaxDim is the largest number of inputs auto gives the
	// surrogate: the Kriging model's anisotropic kernel has a length scale
	// per input, and its fit degrades beyond some ten (common practice).
	surrogateMaxDim = 10
)

// akRun is the state of one surrogate estimate.
type akRun struct {
	ctx   context.Context
	cfg   *Settings
	ss    SurrogateSettings
	g     func(u []float64) float64
	dim   int
	res   *Result
	tr    *tracer
	k     *kriging
	z     float64
	evals int
	// stop is the evaluations at which the learning ends: the budget,
	// or FORM's evaluations and Surrogate.MaxLearning when sooner.
	stop int
	nan  int

	mix   *isMixture
	cu    []float64 // candidates, row-major
	cw    []float64 // their importance weights phi(u)/h(u)
	mu    []float64 // predicted g
	sd    []float64 // predictive standard deviation
	taken []bool    // evaluated already (or undefined there)

	crude  bool  // candidates from the standard normal (AK-MCS)
	tuned  int   // training points at the last tuning
	active []int // candidates predicted between predictions of all
	stale  bool  // the others' predictions are of an older model
}

// mixture sets the candidates' density and draws the first of them. The
// standard normal itself (AK-MCS, which sees every failure region) when
// FORM failed or when its pf says that MaxPopulation candidates reach the
// target CoV, n = (1 - pf)/(pf CoV^2): then as many blocks as that n
// needs. Else the importance mixture around FORM's design points (AK-IS),
// which sees only the regions of the points FORM found.
func (a *akRun) mixture(f *FORMResult, target float64) {
	pts := []DesignPoint{{U: make([]float64, a.dim)}}
	blocks := 1
	if f != nil && f.Converged && len(f.Points) > 0 {
		need := (1 - f.Pf) / (f.Pf * target * target)
		if f.Pf > 0 && need <= float64(a.ss.MaxPopulation) {
			blocks = int(math.Ceil(need / float64(a.ss.Population)))
			a.crude = true
		} else {
			pts = f.Points
		}
	} else {
		a.crude = true
	}
	a.mix = isSetup(&uSpace{dim: a.dim}, pts)
	for b := 0; b < max(1, blocks); b++ {
		a.grow()
	}
}

// grow draws one more block of candidates; block b is seeded from (seed,
// b) alone.
func (a *akRun) grow() {
	b := uint64(len(a.cw) / a.ss.Population)
	rng := newBlockRNG()
	rng.seed(a.cfg.Seed, streamSurrogate, b)
	r := rng.r
	u := make([]float64, a.dim)
	lw := make([]float64, len(a.mix.centres))
	for s := 0; s < a.ss.Population; s++ {
		c := 0
		if cum := a.mix.cum; len(cum) > 1 {
			v := r.Float64()
			for c < len(cum)-1 && v >= cum[c] {
				c++
			}
		}
		for i := range u {
			u[i] = a.mix.centres[c][i] + r.NormFloat64()
		}
		a.cu = append(a.cu, u...)
		a.cw = append(a.cw, mixtureWeight(u, a.mix, lw))
	}
	n := len(a.cw)
	a.mu = append(a.mu, make([]float64, n-len(a.mu))...)
	a.sd = append(a.sd, make([]float64, n-len(a.sd))...)
	a.taken = append(a.taken, make([]bool, n-len(a.taken))...)
}

// mixtureWeight returns phi(u)/h(u) for the mixture (as importanceBlock).
func mixtureWeight(u []float64, mix *isMixture, a []float64) float64 {
	amax := math.Inf(-1)
	for j, ck := range mix.centres {
		a[j] = mix.logPi[j] + formDot(u, ck)
		amax = math.Max(amax, a[j])
	}
	var sum float64
	for _, v := range a {
		sum += math.Exp(v - amax)
	}
	return math.Exp(-amax - math.Log(sum))
}

// surrogateMerge is the distance in standard normal space within which a
// FORM point adds nothing to one kept already: FORM's finite differences
// cluster 2n+1 points within 0.05 of each other, which the Kriging model
// learns little from but pays for in every prediction (n^2).
const surrogateMerge = 0.1

// train starts the Kriging model from FORM's points (one of each cluster
// within surrogateMerge) and, when they are too few, the first
// candidates.
func (a *akRun) train(rec *recordSpace) {
	d := a.dim
	for i, g := range rec.gv {
		u := rec.u[i*d : (i+1)*d]
		if math.IsNaN(g) || math.IsInf(g, 0) || a.near(u, surrogateMerge) {
			continue
		}
		a.k.add(u, g)
	}
	for i := 0; a.k.n() < 2*d+2 && i < len(a.cw) && a.evals < a.stop; i++ {
		a.evaluate(i)
	}
}

// near reports whether u lies within dist of a training point.
func (a *akRun) near(u []float64, dist float64) bool {
	d := a.dim
	for i := 0; i < a.k.n(); i++ {
		var s float64
		for j, v := range u {
			e := v - a.k.x[i*d+j]
			s += e * e
		}
		if s < dist*dist {
			return true
		}
	}
	return false
}

// evaluate runs the model at candidate i and adds it to the training set.
func (a *akRun) evaluate(i int) {
	u := a.cu[i*a.dim : (i+1)*a.dim]
	a.taken[i] = true
	g := a.g(u)
	a.evals++
	if math.IsNaN(g) || math.IsInf(g, 0) {
		a.nan++
		return
	}
	a.k.add(u, g)
}
