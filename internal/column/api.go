package column

// Axis selects a bending axis of a section. Index arrays by Major and Minor.
type Axis int

// The axes. Both asks a capacity model to evaluate the two axes and report
// the weaker.
const (
	Major Axis = 0
	Minor Axis = 1
	Both  Axis = 2
)

// Shape is the kind of cross-section.
type Shape int

// The cross-section shapes.
const (
	ShapeI      Shape = iota // doubly symmetric I or H
	ShapeRHS                 // rectangular hollow section
	ShapeCHS                 // circular hollow section
	ShapeRect                // solid rectangle
	ShapeRound               // solid round bar
	ShapeCustom              // area, I and extreme-fibre distance given per axis
)

// Section describes a cross-section by its dimensions (mm). Only the fields
// of its Shape are used:
//
//	I:      Depth, Width, Flange, Web, Root (optional root radius)
//	RHS:    Depth, Width, Thickness, Radius and InnerRadius (corner radii
//	        outside and inside; 0 is a square corner)
//	CHS:    Diameter, Thickness
//	Rect:   Depth, Width
//	Round:  Diameter
//	Custom: Area, IMajor, IMinor, CMajor, CMinor
//
// ThicknessLoss (corrosion of an existing member) is removed from every
// exposed face before properties are computed.
type Section struct {
	Shape                                Shape
	Depth, Width, Flange, Web, Root      float64
	Thickness, Diameter                  float64
	Radius, InnerRadius                  float64 // RHS corner radii
	Area, IMajor, IMinor, CMajor, CMinor float64
	ThicknessLoss                        float64
}

// Props are the properties of a section, per axis indexed by Major and
// Minor: second moment I (mm^4), radius of gyration R (mm), elastic modulus
// W = I/C (mm^3) and extreme-fibre distance C (mm).
//
// AEff and WEff are the effective area and elastic moduli of a class 4
// section (EN 1993-1-5 4.4, see Section.Classify); zero means the section
// is fully effective, A and W. I and R stay the gross ones: the elastic
// critical load is that of the gross section (EN 1993-1-1 6.3.1.2).
type Props struct {
	A          float64
	I, R, W, C [2]float64
	AEff       float64
	WEff       [2]float64
}

// Member is everything a closed-form capacity evaluation needs (N, mm, MPa).
type Member struct {
	Props  Props
	E, Fy  float64
	Length float64
	// K is the effective length factor per axis.
	K [2]float64
	// Bow is the amplitude of the initial half-sine bow and Ecc the end
	// eccentricity of the load; both act by their magnitude.
	Bow, Ecc float64
	// Sway is the initial out-of-plumb angle (rad) of a member whose ends
	// sway in the plane of the axis evaluated; it acts by its magnitude, on
	// every axis evaluated (evaluate one axis at a time for a member that
	// sways in one plane only). See SwayMoment for its effect.
	Sway float64
	// Alpha is the imperfection factor per axis (model "curve").
	Alpha [2]float64
}

// Result is a capacity: the axial resistance N (N), the axis that governs
// and the limit that governed (GovernsFirstYield "first-yield",
// GovernsCurve "buckling-curve", or a beam-column limit such as
// "ultimate").
type Result struct {
	N       float64
	Axis    Axis
	Governs string
}
