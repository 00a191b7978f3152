package column

// Dim names a dimension field of a Section, for code that fills sections
// from a table of dimensions (Section.Field).
type Dim int

// The dimensions of a Section.
const (
	DimDepth         Dim = iota // Depth
	DimWidth                    // Width
	DimFlange                   // Flange
	DimWeb                      // Web
	DimRoot                     // Root
	DimThickness                // Thickness
	DimDiameter                 // Diameter
	DimRadius                   // Radius
	DimArea                     // Area
	DimIMajor                   // IMajor
	DimIMinor                   // IMinor
	DimCMajor                   // CMajor
	DimCMinor                   // CMinor
	DimIt                       // It
	DimIw                       // Iw
	DimShearMajor               // ShearCentre[Major]
	DimShearMinor               // ShearCentre[Minor]
	DimEffArea                  // EffArea
	DimThicknessLoss            // ThicknessLoss
)

// Field returns the field of s that d names, nil for a d that names none.
// It does not allocate, and s does not escape through it.
func (s *Section) Field(d Dim) *float64 {
	switch d {
	case DimDepth:
		return &s.Depth
	case DimWidth:
		return &s.Width
	case DimFlange:
		return &s.Flange
	case DimWeb:
		return &s.Web
	case DimRoot:
		return &s.Root
	case DimThickness:
		return &s.Thickness
	case DimDiameter:
		return &s.Diameter
	case DimRadius:
		return &s.Radius
	case DimArea:
		return &s.Area
	case DimIMajor:
		return &s.IMajor
	case DimIMinor:
		return &s.IMinor
	case DimCMajor:
		return &s.CMajor
	case DimCMinor:
		return &s.CMinor
	case DimIt:
		return &s.It
	case DimIw:
		return &s.Iw
	case DimShearMajor:
		return &s.ShearCentre[Major]
	case DimShearMinor:
		return &s.ShearCentre[Minor]
	case DimEffArea:
		return &s.EffArea
	case DimThicknessLoss:
		return &s.ThicknessLoss
	}
	return nil
}
