package study

import (
	"strings"

	"strutrisk/internal/column"
)

// sectionDim is a dimension key of [member.section]: how it is read, the
// field of column.Section it sets and how it is checked.
type sectionDim struct {
	// info is the key's row of the key table.
	info KeyInfo
	// opt is the quantity form the parser reads.
	opt qopt
	// dim is the field of column.Section the key sets.
	dim column.Dim
	// ranged: a random value must keep the section valid over its whole
	// range (checkSection).
	ranged bool
	// sane is the range outside which a value is probably not what was
	// meant (plausible.go); what == "" when there is none.
	sane plausible
}

// sectionDims is the one table of section dimensions: the parser reads
// them, the key table lists them, the model places them in its fields
// (fSec0 + index, model.go), and the checks find their section fields
// here. The shapes that take each are in shapeDims.
var sectionDims = [...]sectionDim{
	{KeyInfo{Name: "depth", Takes: "quantity (length)", Meaning: "Overall depth (I, RHS, rect, channel, tee); the leg along the depth (angle)."},
		qopt{dim: Length, need: positive}, column.DimDepth, true,
		plausible{lo: 10, hi: 5e3, what: "a section's depth"}},
	{KeyInfo{Name: "width", Takes: "quantity (length)", Meaning: "Overall width (I, RHS, rect, channel, tee); the other leg (angle)."},
		qopt{dim: Length, need: positive}, column.DimWidth, true,
		plausible{lo: 10, hi: 5e3, what: "a section's width"}},
	{KeyInfo{Name: "flange", Takes: "quantity (length)", Meaning: "Flange thickness (I, channel, tee)."},
		qopt{dim: Length, need: positive}, column.DimFlange, true,
		plausible{lo: 0.5, hi: 200, what: "a plate thickness"}},
	{KeyInfo{Name: "web", Takes: "quantity (length)", Meaning: "Web thickness (I, channel, tee)."},
		qopt{dim: Length, need: positive}, column.DimWeb, true,
		plausible{lo: 0.5, hi: 200, what: "a plate thickness"}},
	{KeyInfo{Name: "root", Takes: "quantity (length)", Default: "0", Meaning: "Root radius between web and flanges (I), between the legs (angle)."},
		qopt{dim: Length, need: nonNegative}, column.DimRoot, false, plausible{}},
	{KeyInfo{Name: "thickness", Takes: "quantity (length)", Meaning: "Wall thickness (RHS, CHS); leg thickness (angle)."},
		qopt{dim: Length, need: positive}, column.DimThickness, true,
		plausible{lo: 0.5, hi: 200, what: "a plate thickness"}},
	{KeyInfo{Name: "diameter", Takes: "quantity (length)", Meaning: "Outside diameter (CHS, round)."},
		qopt{dim: Length, need: positive}, column.DimDiameter, true,
		plausible{lo: 10, hi: 5e3, what: "a section's diameter"}},
	{KeyInfo{Name: "area", Takes: "quantity (area)", Meaning: "Area (custom)."},
		qopt{dim: Area, need: positive}, column.DimArea, false, plausible{}},
	{KeyInfo{Name: "i_major", Takes: "quantity (second moment of area)", Meaning: "Second moment of area about the major axis (custom)."},
		qopt{dim: SecondMoment, need: positive}, column.DimIMajor, false, plausible{}},
	{KeyInfo{Name: "i_minor", Takes: "quantity (second moment of area)", Meaning: "Second moment of area about the minor axis (custom)."},
		qopt{dim: SecondMoment, need: positive}, column.DimIMinor, false, plausible{}},
	{KeyInfo{Name: "c_major", Takes: "quantity (length)", Meaning: "Distance from the major axis to the extreme fibre (custom)."},
		qopt{dim: Length, need: positive}, column.DimCMajor, false, plausible{}},
	{KeyInfo{Name: "c_minor", Takes: "quantity (length)", Meaning: "Distance from the minor axis to the extreme fibre (custom)."},
		qopt{dim: Length, need: positive}, column.DimCMinor, false, plausible{}},
	{KeyInfo{Name: "it", Takes: "quantity (second moment of area)", Default: "none: torsional buckling is not checked, with a warning",
		Meaning: "St Venant torsion constant (custom)."},
		qopt{dim: SecondMoment, need: nonNegative}, column.DimIt, false, plausible{}},
	{KeyInfo{Name: "iw", Takes: "quantity (warping constant, e.g. cm6)", Default: "0", Meaning: "Warping constant (custom; needs it)."},
		qopt{dim: Warping, need: nonNegative}, column.DimIw, false, plausible{}},
	{KeyInfo{Name: "y0", Takes: "quantity (length, either sign)", Default: "0",
		Meaning: "Shear centre from the centroid along the major (y-y) axis (custom; needs it; EN 1993-1-3 6.2.3 notation)."},
		qopt{dim: Length}, column.DimShearMajor, false, plausible{}},
	{KeyInfo{Name: "z0", Takes: "quantity (length, either sign)", Default: "0",
		Meaning: "Shear centre from the centroid along the minor (z-z) axis (custom; needs it)."},
		qopt{dim: Length}, column.DimShearMinor, false, plausible{}},
	{KeyInfo{Name: "effective_area", Takes: "quantity (area)", Default: "the area (fully effective)",
		Meaning: "Effective area of a class 4 custom section (EN 1993-1-5 4.4): the capacity models take it as A_eff, with the elastic moduli scaled by (A_eff/A)^2 (a conservative simplification)."},
		qopt{dim: Area, need: positive}, column.DimEffArea, false, plausible{}},
	{KeyInfo{Name: "thickness_loss", Takes: "quantity (length)", Default: "0",
		Meaning: "Corrosion loss from every face (not on custom): I sections, angles, channels and tees lose it on every face, RHS and CHS on the outside."},
		qopt{dim: Length, need: nonNegative}, column.DimThicknessLoss, false,
		plausible{lo: 0, hi: 50, what: "a thickness loss"}},
	{KeyInfo{Name: "radius", Takes: "quantity (length)", Default: "by fabrication: cold-formed 2t to 3t (EN 10219-2), hot-finished 1.5t (EN 10210-2), welded 0",
		Meaning: "Outer corner radius (RHS); the inner one is radius - thickness (the defaults: cold-formed t to 2t, hot-finished t). It enters the area, second moments and the flat widths of the section class."},
		qopt{dim: Length, need: nonNegative}, column.DimRadius, true, plausible{}},
}

// shapeInfo is what the study needs to know of a section shape.
type shapeInfo struct {
	// required and optional are the dimension keys the shape takes.
	required, optional []string
	// note is what the key table adds to the shape's keys.
	note string
	// classified: each sample finds its section class (EN 1993-1-1 Table
	// 5.2); a custom section is classified only when it gives
	// effective_area.
	classified bool
	// open: an angle, channel or tee. The shift of its effective centroid
	// is not modelled (class 4 with a reduced part is refused) and the
	// fibre section of the ultimate beam-column does not cover it.
	open bool
}

// shapeDims is the one table of section shapes, indexed by column.Shape:
// the dimensions each takes, required and optional (every shape but
// custom also takes thickness_loss), and how the study treats it.
var shapeDims = [...]shapeInfo{
	column.ShapeI:       {required: []string{"depth", "width", "flange", "web"}, optional: []string{"root", "thickness_loss"}, classified: true},
	column.ShapeRHS:     {required: []string{"depth", "width", "thickness"}, optional: []string{"radius", "thickness_loss"}, classified: true},
	column.ShapeCHS:     {required: []string{"diameter", "thickness"}, optional: []string{"thickness_loss"}, classified: true},
	column.ShapeRect:    {required: []string{"depth", "width"}, optional: []string{"thickness_loss"}},
	column.ShapeRound:   {required: []string{"diameter"}, optional: []string{"thickness_loss"}},
	column.ShapeCustom:  {required: []string{"area", "i_major", "i_minor", "c_major", "c_minor"}, optional: []string{"it", "iw", "y0", "z0", "effective_area"}},
	column.ShapeAngle:   {required: []string{"depth", "width", "thickness"}, optional: []string{"root", "thickness_loss"}, note: "the two legs", classified: true, open: true},
	column.ShapeChannel: {required: []string{"depth", "width", "flange", "web"}, optional: []string{"thickness_loss"}, classified: true, open: true},
	column.ShapeTee:     {required: []string{"depth", "width", "flange", "web"}, optional: []string{"thickness_loss"}, classified: true, open: true},
}

// shapeNames returns the study-file names of the shapes, in the order of
// their constants.
func shapeNames() []string {
	names := make([]string, len(shapeDims))
	for s := range shapeDims {
		names[s] = column.Shape(s).String()
	}
	return names
}

// sectionKeyInfos returns the key table's rows of [member.section]: the
// shape, every dimension, and the fabrication.
func sectionKeyInfos() []KeyInfo {
	var what []string
	for s, d := range shapeDims {
		w := column.Shape(s).String() + ": " + strings.Join(d.required, " ")
		var opt []string
		for _, k := range d.optional {
			if k != "thickness_loss" {
				opt = append(opt, k)
			}
		}
		if len(opt) > 0 {
			w += " (" + strings.Join(opt, " ") + ")"
		}
		if d.note != "" {
			w += ", " + d.note
		}
		what = append(what, w)
	}
	rows := []KeyInfo{{Name: "shape", Takes: "text", Choices: shapeNames(), Required: true, Meaning: strings.Join(what, "; ") + "."}}
	for _, d := range sectionDims {
		rows = append(rows, d.info)
	}
	return append(rows, KeyInfo{Name: "fabrication", Takes: "text", Choices: column.FabricationNames(),
		Default: "welded (I), cold-formed (RHS, CHS), hot-rolled (rect, round, angle, channel, tee)",
		Meaning: "How the section is made (not on custom): I hot-rolled or welded; RHS cold-formed, hot-finished or welded (a box); CHS cold-formed or hot-finished; solids, angles, channels and tees hot-rolled. It picks the EN 1993-1-1 Table 6.2 buckling curve and the RHS corner radii."})
}

// dimIndex returns the index in sectionDims of the dimension key, or -1.
func dimIndex(key string) int {
	for i, d := range sectionDims {
		if d.info.Name == key {
			return i
		}
	}
	return -1
}

// sectionField returns the field of sec that the dimension key sets.
func sectionField(sec *column.Section, key string) *float64 {
	i := dimIndex(key)
	if i < 0 {
		panic("study: unknown section key " + key)
	}
	return sec.Field(sectionDims[i].dim)
}
