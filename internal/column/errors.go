package column

import "errors"

// Errors returned by the capacity models and the effective length
// functions. They are package-level values, so an evaluation that fails
// allocates nothing either; compare with errors.Is.
var (
	ErrLength       = errors.New("column: member length must be positive and finite")
	ErrModulus      = errors.New("column: elastic modulus E must be positive and finite")
	ErrYield        = errors.New("column: yield strength fy must be positive and finite")
	ErrArea         = errors.New("column: section area A must be positive and finite")
	ErrRadius       = errors.New("column: radius of gyration r must be positive and finite")
	ErrFibre        = errors.New("column: extreme-fibre distance c must be positive and finite")
	ErrK            = errors.New("column: effective length factor K must be positive and finite")
	ErrImperfection = errors.New("column: bow, eccentricity and sway must be finite numbers")
	ErrAlpha        = errors.New("column: imperfection factor alpha must be non-negative and finite")
	ErrAxis         = errors.New("column: axis must be Major, Minor or Both")
	ErrSpring       = errors.New("column: end spring stiffness must be non-negative (0 pinned, +Inf fixed)")
	ErrRange        = errors.New("column: the squash load A fy is out of the floating-point range; check the units")
	ErrShear        = errors.New("column: shear modulus G must be positive and finite (0 takes E / 2.6)")
	ErrTorsion      = errors.New("column: torsion constant It and warping constant Iw must be non-negative and finite, the shear-centre position finite")
	ErrTwisting     = errors.New("column: the lowest elastic critical load twists the section (torsional or flexural-torsional buckling); the beam-column model bends in one plane only: use the perry-robertson, secant or curve model")
	ErrSecond       = errors.New("column: second moment of area I must be positive and finite")
)
