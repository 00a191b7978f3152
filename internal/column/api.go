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
	ShapeI       Shape = iota // doubly symmetric I or H
	ShapeRHS                  // rectangular hollow section
	ShapeCHS                  // circular hollow section
	ShapeRect                 // solid rectangle
	ShapeRound                // solid round bar
	ShapeCustom               // area, I and extreme-fibre distance given per axis
	ShapeAngle                // equal or unequal angle (L)
	ShapeChannel              // channel (C or U)
	ShapeTee                  // tee (T)
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
//	Custom: Area, IMajor, IMinor, CMajor, CMinor (optional It, Iw, ShearCentre)
//	Angle:  Depth, Width (the two legs), Thickness, Root (optional)
//	Channel, Tee: Depth, Width, Flange, Web
//
// ThicknessLoss (corrosion of an existing member) is removed from every
// exposed face before properties are computed.
type Section struct {
	Shape                                Shape
	Depth, Width, Flange, Web, Root      float64
	Thickness, Diameter                  float64
	Radius, InnerRadius                  float64 // RHS corner radii
	Area, IMajor, IMinor, CMajor, CMinor float64
	// It and Iw are the St Venant torsion constant (mm^4) and the warping
	// constant (mm^6) of a custom section; It = 0 leaves its torsional
	// buckling unchecked. ShearCentre is the position of its shear centre
	// from the centroid along the major and the minor principal axis (mm).
	It, Iw        float64
	ShearCentre   [2]float64
	ThicknessLoss float64
	// EffArea is the effective area of a class 4 custom section (mm^2,
	// EN 1993-1-5 4.4, given by the user); 0 means fully effective. See
	// Section.Classify.
	EffArea float64
}

// Props are the properties of a section, per axis indexed by Major and
// Minor: second moment I (mm^4), radius of gyration R (mm), elastic modulus
// W = I/C (mm^3) and extreme-fibre distance C (mm), the larger of the two
// sides CSide (a bow or eccentricity that acts by its magnitude takes the
// worse side of a monosymmetric section).
//
// Bending about an axis stresses in proportion to the distance from it:
// C[Major] is measured along the minor axis and C[Minor] along the major
// one. S is the shear centre from the centroid, S[Major] its coordinate
// along the major axis and S[Minor] along the minor one. It is the St
// Venant torsion constant (mm^4; 0: unknown, torsional buckling is not
// checked) and Iw the warping constant (mm^6). Angle (rad) turns the
// width direction of the drawn section onto the major axis (0 for a
// section whose major axis is parallel to its width).
//
// AEff and WEff are the effective area and elastic moduli of a class 4
// section (EN 1993-1-5 4.4, see Section.Classify); zero means the section
// is fully effective, A and W. I and R stay the gross ones: the elastic
// critical load is that of the gross section (EN 1993-1-1 6.3.1.2).
type Props struct {
	A          float64
	I, R, W, C [2]float64
	CSide      [2][2]float64
	S          [2]float64
	It, Iw     float64
	Angle      float64
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
	// G is the shear modulus for torsional buckling; 0 takes
	// E / (2 (1 + 0.3)), steel's Poisson ratio.
	G float64
	// Kind is the material (Steel, the zero value, Stainless, Aluminium or
	// Timber). Lambda0 is the plateau of its buckling curves, the relative
	// slenderness up to which chi = 1 (see MaterialCurve); it is read for
	// every kind but Steel, whose plateau is 0.2 (EN 1993-1-1 6.3.1.2).
	Kind    Kind
	Lambda0 float64
}

// Result is a capacity: the axial resistance N (N), the axis that governs
// and the limit that governed (GovernsFirstYield "first-yield",
// GovernsCurve "buckling-curve", or a beam-column limit such as
// "ultimate"). Mode is the buckling mode of that resistance; a torsional
// or flexural-torsional mode reports Axis Minor.
type Result struct {
	N       float64
	Axis    Axis
	Governs string
	Mode    Mode
}
