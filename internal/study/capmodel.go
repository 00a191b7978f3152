package study

// CapacityModel is a capacity model a study names in capacity.model: what
// it needs from the rest of the study, how it evaluates a member, and what
// the checks, the run and the pictures must know of it (Traits).
//
// Each model is one file of this package (model_<name>.go) and one line
// of capacityModels: the key table, the parser, the checks, the run and
// the pictures all read the registry and the traits, never the name.
type CapacityModel interface {
	// String returns the model's name, the value of capacity.model.
	String() string
	// Traits returns what the study and the run need to know of the model
	// with the options st gives it.
	Traits(st *Study) Traits
	// keys are the keys of [capacity] the model alone takes (besides
	// axis, model_factor, curve, alpha and imperfection); a study of
	// another model that gives one is refused.
	keys() []string
	// options reads the model's keys from the [capacity] table t into
	// p.st and lists the defaults that apply.
	options(p *parser, t *table)
	// check reports what the model needs from the rest of the study
	// (p.st), once the whole file is read.
	check(p *parser)
	// kernel is the mechanics that evaluate one sample's capacity.
	kernel() kernel
}

// kernel is the mechanics a capacity model evaluates a sample with. The
// per-sample path (Model.evaluate) dispatches on it with a switch: a call
// through the CapacityModel interface would move each sample's member to
// the heap, as the compiler cannot see where an interface method keeps
// its arguments. A model with new mechanics adds a kernel and its case.
type kernel int

// The kernels.
const (
	kernelFirstYield kernel = iota // column.FirstYield
	kernelCurve                    // column.Curve
	kernelBeam                     // column.BeamColumn, with the study's beamOptions
)

// Traits are what the checks, the run and the pictures need to know of a
// capacity model.
type Traits struct {
	// Curve: the model is a buckling curve. It takes an imperfection
	// factor per axis (capacity.curve or alpha; EN 1993-1-1 Table 6.2 by
	// default), which carries the imperfections: the geometric bow,
	// eccentricity and sway are not read. The modes that twist the
	// section are checked by the curve too.
	Curve bool
	// Planar: the model bends the member in one plane, one axis at a
	// time; a mode that twists the section is out of its reach.
	Planar bool
	// Bending: the model carries the bending of the member besides its
	// axial buckling, which the code check of EN 1993-1-1 6.3.1 leaves out.
	Bending bool
	// Ultimate: the model follows the member to its plastic collapse on
	// the gross fibre section; it refuses class 4 sections, open sections
	// (angle, channel, tee) and the equivalent imperfection.
	Ultimate bool
	// Expensive: each evaluation is a numerical analysis. Sobol indices
	// are off unless asked for, the tornado's bars take no FORM betas,
	// the slenderness picture has no cloud of sampled members, capacity
	// and demand are described from a smaller auxiliary sample, and run
	// warns when the budget would take long.
	Expensive bool
	// FORMStep is the relative finite-difference step of FORM for a
	// model whose capacity carries numerical noise (sim.FORMSettings.Step);
	// 0 keeps sim's default.
	FORMStep float64
	// Options names the model's options for legends and case names
	// ("ultimate"); "" when it has none.
	Options string
	// NoResidual says how the model leaves out the residual stresses of a
	// rolled or welded section ("the first-yield beam-column (a geometric
	// imperfection alone)"), for the warning that compares it with the
	// buckling curve; "" when it does not.
	NoResidual string
}

// numericalStep is the relative finite-difference step of FORM for a
// capacity model whose result carries numerical noise (Traits.FORMStep):
// the beam-column at its ultimate load, about 1e-5 of the capacity from
// the path of the nonlinear solution (sim.FORMSettings.Step says why
// 1e-2). The reserve search retries with it when FORM does not converge.
const numericalStep = 1e-2

// capacityModels is the one registry of capacity models: capacity.model
// takes their names, in this order, and the first is the default.
var capacityModels = []CapacityModel{perryRobertson{}, secant{}, bucklingCurve{}, beamColumn{}}

// defaultModel is the capacity model of a study that names none.
var defaultModel = capacityModels[0]

// modelNames returns the names of the registered capacity models.
func modelNames() []string {
	names := make([]string, len(capacityModels))
	for i, m := range capacityModels {
		names[i] = m.String()
	}
	return names
}

// modelNamed returns the registered capacity model named name, or nil.
func modelNamed(name string) CapacityModel {
	for _, m := range capacityModels {
		if m.String() == name {
			return m
		}
	}
	return nil
}

// ModelTraits returns the traits of the study's capacity model with its
// options (none while the parser has no valid model).
func (s *Study) ModelTraits() Traits {
	if s.Model == nil {
		return Traits{}
	}
	return s.Model.Traits(s)
}

// parseError reports err, from reading the value of key after the key
// table accepted it, as a problem of key; it returns whether err is nil.
func (p *parser) parseError(key string, err error) bool {
	if err != nil {
		p.errorf(key, "%v", err)
	}
	return err == nil
}

// modelOptions reads the keys of [capacity] table t that belong to the
// study's model and refuses those of other models.
func (p *parser) modelOptions(t *table) {
	st := p.st
	if st.Model == nil {
		return // refused by the choice of capacity.model
	}
	for _, other := range capacityModels {
		if other == st.Model {
			continue
		}
		for _, k := range other.keys() {
			if _, given := t.m[k]; given {
				t.used[k] = true
				p.errorf(t.key(k), "%s applies to model = %q only (the model is %q)", k, other, st.Model)
			}
		}
	}
	st.Model.options(p, t)
}
