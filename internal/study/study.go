package study

import (
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"os"
	"path/filepath"
	"strings"

	"strutrisk/internal/column"
	"strutrisk/sim"
)

// Study is a checked study file with every quantity in N, mm and MPa.
type Study struct {
	// File is the study's name as given to Load; SHA256 is the hex digest
	// of its bytes.
	File, SHA256 string
	// Data is the study file byte for byte, as SHA256 was taken of it
	// (the HTML report embeds it).
	Data  []byte
	Title string
	// Record is the filing head of [record] (record.go).
	Record Record
	// Life is the remaining life under corrosion ([life]), nil when the
	// study has no [life] table (see life.go).
	Life *LifeSpec
	// Calibration is the partial-factor calibration ([calibration],
	// calibration.go), nil when the study has none.
	Calibration *CalibrationSpec
	// Units is the unit system of bare numbers ("N-mm", "kN-m", "kip-in").
	Units System

	// Quantities lists every numeric input in the order of the file.
	Quantities []*Quantity

	Length  *Quantity
	Section SectionSpec
	Modulus *Quantity
	Yield   *Quantity // material.yield, or material.strength of timber
	// Material is the material's kind and the keys of that kind
	// (materials.go).
	Material MaterialSpec
	// Shear is material.shear_modulus; nil takes E / (2 (1 + 0.3)) per
	// sample.
	Shear    *Quantity
	Ends     [2]EndSpec // indexed by column.Major, column.Minor
	Bow, Ecc *Quantity  // nil when not given
	// Sway is the initial out-of-plumb angle (rad, nil when not given);
	// SwayAxes says about which axes the member sways (see sway.go).
	Sway     *Quantity
	SwayAxes [2]bool
	// Imperfection is "geometric" (the bow and eccentricity as given, the
	// default) or "equivalent" (the equivalent bow of the EN 1993-1-1
	// buckling curve, see equivalent.go).
	Imperfection string
	// Model is the capacity model (capmodel.go).
	Model        CapacityModel
	Axis         column.Axis
	Alpha        [2]*Quantity     // a buckling curve's (Traits.Curve)
	Curve        [2]string        // curve letters when given by name
	Limit        column.BeamLimit // beam-column: its limit state
	Residual     column.Residual  // beam-column: its residual stresses
	Profile      []float64        // beam-column: measured bow offsets (mm)
	ModelFactor  *Quantity        // nil means 1
	Loads        []*Quantity
	EffectFactor *Quantity // nil means 1
	Corr         []sim.Correlation

	// Target is the target reliability index; HasTarget says whether one
	// was given.
	Target    float64
	HasTarget bool
	// TargetSource says where Target came from ("target.beta as given", or
	// the table and the conversion; see targetsource.go).
	TargetSource string
	// ReferencePeriod is the target's reference period ("50 years", or
	// free text as written); ReferenceYears is it in years, 0 when it was
	// not given or is not a duration.
	ReferencePeriod string
	ReferenceYears  float64
	// ReserveOn is "variable" or "all": the loads the reserve factor
	// multiplies; PermanentLoads are the paths of the loads taken as
	// permanent (see target.go).
	ReserveOn      string
	PermanentLoads []string

	// Combination is how two or more random variable loads combine (see
	// combination.go); nil with fewer.
	Combination *Combination
	// Bending is [bending] (bending.go), nil when the member carries axial
	// loads alone; with it the limit state is the load factor.
	Bending *BendingSpec

	// CodeCheck holds the partial factors of the deterministic code check
	// ([code_check], see codecheck.go).
	CodeCheck CodeCheckSpec

	// Measurements are the test results that updated quantities of the
	// study (see measure.go).
	Measurements []*Measurement

	Analysis    Analysis
	Sensitivity Sensitivity
	// Sweep is a [sweep] of one key; Grid one of several keys
	// ([[sweep.axis]]). At most one of them is set; SweptAxes and
	// SweptPoints read either.
	Sweep    *Sweep
	Grid     *Grid
	Variants []Variant
	// Inventory, when not nil, is the study's [inventory] (inventory.go).
	Inventory *Inventory
	Output    Output

	// Defaults lists the defaults that applied, Warnings the things a
	// reader should know; both are full sentences naming the key.
	Defaults, Warnings []string

	// src is the decoded file, read again by Derive.
	src *source
}

// SectionSpec is the cross-section: its shape and its dimensions.
type SectionSpec struct {
	Shape column.Shape
	Name  string // as written: "I", "RHS", ...
	// Dims holds the dimension quantities by key ("depth", "flange", ...,
	// "thickness_loss").
	Dims map[string]*Quantity
	// Fabrication is how the section is made (given, or the shape's
	// default: see fabrication.go); NoFabrication for a custom section.
	Fabrication column.Fabrication
}

// EndSpec is how the effective length factor of one axis is given.
type EndSpec struct {
	// How is "k", "ends", "springs" or "default".
	How string
	// K is the factor (How "k" or "default"; for "ends" a fixed value).
	K *Quantity
	// Ends is the end-condition name (How "ends").
	Ends string
	// Top and Bottom are the rotational end springs (How "springs").
	Top, Bottom *Quantity
}

// Analysis are the sampling settings.
type Analysis struct {
	Method    sim.Method
	Samples   int64
	TargetCoV float64
	Seed      uint64
}

// Sensitivity are the sensitivity settings: a tornado between two
// fractiles, and Sobol indices from a number of base samples.
type Sensitivity struct {
	Tornado                 bool
	TornadoLow, TornadoHigh float64
	Sobol                   bool
	SobolSamples            int
}

// Output says where results go.
type Output struct {
	// Dir is [output] dir as written (relative to the study file's folder:
	// the command resolves it); DirLine is its line, 0 when not given.
	Dir     string
	DirLine int
	Formats []string
}

// Load reads and checks the study file at path. A file with problems
// returns an *Error listing all of them.
func Load(path string) (*Study, error) {
	data, err := readLimited(path)
	if err != nil {
		if errors.Is(err, os.ErrNotExist) {
			return nil, &Error{Problems: []Problem{{File: path, Msg: "no such file (give the path of a study; `strutrisk new` prints a starter)"}}}
		}
		return nil, &Error{Problems: []Problem{{File: path, Msg: err.Error()}}}
	}
	return Parse(path, data)
}

// Parse checks the study file contents data; name is used in messages and
// for the default title.
func Parse(name string, data []byte) (*Study, error) {
	if len(data) > MaxFileSize {
		return nil, &Error{Problems: []Problem{{File: name, Msg: errTooLarge.Error()}}}
	}
	if pr := nestingProblem(name, data); pr != nil {
		return nil, &Error{Problems: []Problem{*pr}}
	}
	sum := sha256.Sum256(data)
	p := newParser(name, data)
	st := p.parse()
	if len(p.probs) > 0 {
		return nil, p.problems()
	}
	st.File = name
	st.SHA256 = hex.EncodeToString(sum[:])
	st.Data = data
	st.src = newSource(p.raw, p.lines)
	// Every variant at every swept value is checked now, so a run does
	// not stop half way (see sweep.go).
	if e := st.checkCases(); e != nil {
		return nil, e
	}
	if e := st.readInventory(); e != nil {
		return nil, e
	}
	return st, nil
}

// Name returns the study's short name: the file name without extension.
func (s *Study) Name() string {
	return strings.TrimSuffix(filepath.Base(s.File), filepath.Ext(s.File))
}
