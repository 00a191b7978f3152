package column

import (
	"errors"
	"math"
)

// Interaction is what the member interaction of EN 1993-1-1 6.3.3 needs
// beside the member (InteractionFactor).
type Interaction struct {
	// Class is the cross-section class, 1 to 4 (0 is taken as 3): classes
	// 1 and 2 resist Wpl fy with the plastic interaction factors, class 3
	// W fy and class 4 W_eff fy with the elastic ones (Annex B).
	Class int
	// Plastic is Wpl about the major and the minor axis (mm^3), needed by
	// classes 1 and 2 (Section.PlasticModulus).
	Plastic [2]float64
	// Open marks a member susceptible to torsional deformations (an open
	// section: Annex B Table B.2, and lateral-torsional buckling under
	// major-axis bending with chi_LT); otherwise Table B.1 with
	// chi_LT = 1 (a hollow section).
	Open bool
	// IShape takes the plastic k_zz of an I section in Table B.1 (the
	// hollow sections' otherwise).
	IShape bool
	// AlphaLT is the imperfection factor of the lateral-torsional buckling
	// curve (LTBCurveAlpha) and Rolled selects 6.3.2.3 over 6.3.2.2
	// (ChiLT).
	AlphaLT float64
	Rolled  bool
}

var errInteraction = errors.New("column: the 6.3.3 interaction of a class 1 or 2 section needs its plastic moduli, and an open section bent about its major axis needs its torsion constant It for lateral-torsional buckling")

// MomentFactorCm returns the equivalent uniform moment factor C_m of
// EN 1993-1-1:2005 Annex B Table B.3 for the moment diagram of a member of
// length l (mm) with end moments ma and mb (N mm; the same sign is single
// curvature) and a uniform load q (N/mm). With M_h the end moment of the
// larger magnitude, psi M_h the other and M_s the moment at mid-length
// ((ma + mb)/2 + q l^2/8):
//
//	linear (q = 0):                 C_m = 0.6 + 0.4 psi >= 0.4
//	|M_s| <= |M_h|, a_s = M_s/M_h:  0 <= a_s:           0.2 + 0.8 a_s >= 0.4
//	                                a_s < 0, psi >= 0:  0.1 - 0.8 a_s >= 0.4
//	                                a_s < 0, psi < 0:   0.1 (1 - psi) - 0.8 a_s >= 0.4
//	|M_s| > |M_h|, a_h = M_h/M_s:   a_h >= 0 or psi >= 0: 0.95 + 0.05 a_h
//	                                a_h < 0, psi < 0:     0.95 + 0.05 a_h (1 + 2 psi)
//
// (the uniform-load column of the table).
func MomentFactorCm(ma, mb, q, l float64) float64 {
	mh, other := ma, mb
	if math.Abs(mb) > math.Abs(ma) {
		mh, other = mb, ma
	}
	psi := 1.0
	if mh != 0 {
		psi = other / mh
	}
	if q == 0 {
		return math.Max(0.6+0.4*psi, 0.4)
	}
	ms := (ma+mb)/2 + q*l*l/8
	if math.Abs(ms) <= math.Abs(mh) {
		as := ms / mh
		switch {
		case as >= 0:
			return math.Max(0.2+0.8*as, 0.4)
		case psi >= 0:
			return math.Max(0.1-0.8*as, 0.4)
		}
		return math.Max(0.1*(1-psi)-0.8*as, 0.4)
	}
	ah := mh / ms
	if ah >= 0 || psi >= 0 {
		return 0.95 + 0.05*ah
	}
	return 0.95 + 0.05*ah*(1+2*psi)
}

// iaTerms are the resistances and factors of one interaction evaluation.
type iaTerms struct {
	nrk, mrk        float64 // N_Rk and M_Rk about the bending axis
	chiY, chiZ      float64 // flexural buckling (chiZ with the twisting modes)
	chiLT           float64
	lamY, lamZ      float64
	cm              float64 // C_my, C_mz or C_mLT: one moment diagram
	n, mEd          float64 // axial load and largest first-order moment at factor 1
	axis            Axis
	plastic, open   bool
	iShape, tension bool
}

// InteractionFactor returns the load factor of a member under the axial
// compression n (N) and the bending b by the member interaction of EN
// 1993-1-1:2005 6.3.3, eqs. (6.61) and (6.62), with the interaction
// factors of Annex B (Table B.1, or B.2 for an open section) and C_m of
// Table B.3 (MomentFactorCm, one diagram for C_my, C_mz and C_mLT), and
// the cross-section check of 6.2.1(7), eq. (6.2), N/N_Rk + M/M_Rk <= 1 at
// the section of the largest first-order moment (conservative for
// classes 1 and 2). Partial factors are 1; the factor is the one at which
// the largest of the three utilisations reaches 1.
//
// chi_y and chi_z are those of eq. (6.49) with Member.Alpha (chi_z the
// smaller with the modes that twist the section, 6.3.1.4, when It is
// given); N_Rk = A fy (A_eff fy for class 4). An open section bent about
// its major axis takes chi_LT of ChiLT at sqrt(W fy / Mcr), Mcr of
// CriticalMoment with MomentFactorC1. The first-order moments are those
// of the member of length L (the end moments are the ends' own); the
// buckling lengths are K L. A tension n takes the bending alone with the
// interaction factors at N = 0 and the tension in the cross-section check.
func InteractionFactor(m *Member, n float64, b *Bending, in *Interaction) (Factor, error) {
	if err := checkBending(m, n, b); err != nil {
		return Factor{}, err
	}
	if err := m.Validate(Both); err != nil {
		return Factor{}, err
	}
	t, err := interactionTerms(m, n, b, in)
	if err != nil {
		return Factor{}, err
	}
	res := Factor{Axis: b.Axis, Mode: flexuralMode(b.Axis), Governs: GovernsInteraction}
	lo := 1 / (math.Abs(n)/t.nrk + t.mEd/t.mrk) // the cross-section check reaches 1
	if math.IsInf(lo, 1) {
		res.Factor = lo
		return res, nil
	}
	u := func(f float64) float64 { return t.utilisation(f) - 1 }
	res.Factor = brent(u, 0, lo, -1, u(lo), 1e-13*lo)
	return res, nil
}

// interactionTerms computes the resistances and reduction factors.
func interactionTerms(m *Member, n float64, b *Bending, in *Interaction) (iaTerms, error) {
	a := b.Axis
	p := &m.Props
	t := iaTerms{axis: a, n: n, open: in.Open, iShape: in.IShape, tension: n <= 0}
	t.nrk = p.EffectiveArea() * m.Fy
	t.lamY, t.lamZ = relSlenderness(m, Major), relSlenderness(m, Minor)
	t.chiY = ReductionFactor(t.lamY, m.Alpha[Major], m.plateau())
	t.chiZ = ReductionFactor(t.lamZ, m.Alpha[Minor], m.plateau())
	if p.It != 0 {
		t.chiZ = math.Min(t.chiZ, twisting(m, GovernsCurve).N/t.nrk)
	}
	w := p.EffectiveModulus(a)
	if !(w > 0) {
		w = bcModulus(m, a) // W not given: I/C, as the other models take it
	}
	switch in.Class {
	case 1, 2:
		if !(in.Plastic[a] > 0) {
			return t, errInteraction
		}
		w, t.plastic = in.Plastic[a], true
	}
	t.mrk = w * m.Fy
	t.mEd, _ = SecondOrderMoment(0, 1, m.Length, b.Bottom, b.Top, b.Lateral)
	t.cm = MomentFactorCm(b.Bottom, b.Top, b.Lateral, m.Length)
	t.chiLT = 1
	if in.Open && a == Major {
		if p.It == 0 {
			return t, errInteraction
		}
		mcr := CriticalMoment(m, MomentFactorC1(b.Bottom, b.Top, b.Lateral))
		t.chiLT = ChiLT(math.Sqrt(t.mrk/mcr), in.AlphaLT, in.Rolled)
	}
	return t, nil
}

// utilisation returns the largest of eqs. (6.61), (6.62) and (6.2) at the
// load factor f.
func (t *iaTerms) utilisation(f float64) float64 {
	n, m := f*t.n, f*t.mEd
	if t.tension {
		n = 0
	}
	ny, nz := n/(t.chiY*t.nrk), n/(t.chiZ*t.nrk)
	kyy, kzz := t.kyy(ny), t.kzz(nz)
	var u1, u2 float64
	if t.axis == Major {
		kzy := 0.8 * kyy
		if t.plastic {
			kzy = 0.6 * kyy
		}
		if t.open {
			kzy = t.kzyOpen(nz)
		}
		u1 = ny + kyy*m/(t.chiLT*t.mrk)
		u2 = nz + kzy*m/(t.chiLT*t.mrk)
	} else {
		kyz := kzz
		if t.plastic {
			kyz = 0.6 * kzz
		}
		u1 = ny + kyz*m/t.mrk
		u2 = nz + kzz*m/t.mrk
	}
	u3 := math.Abs(f*t.n)/t.nrk + m/t.mrk
	return math.Max(u3, math.Max(u1, u2))
}

// kyy is k_yy of Annex B Tables B.1 and B.2 at n_y = N/(chi_y N_Rk).
func (t *iaTerms) kyy(ny float64) float64 {
	if t.plastic {
		return t.cm * math.Min(1+(t.lamY-0.2)*ny, 1+0.8*ny)
	}
	return t.cm * math.Min(1+0.6*t.lamY*ny, 1+0.6*ny)
}

// kzz is k_zz of Annex B Tables B.1 and B.2 at n_z = N/(chi_z N_Rk).
func (t *iaTerms) kzz(nz float64) float64 {
	switch {
	case !t.plastic:
		return t.cm * math.Min(1+0.6*t.lamZ*nz, 1+0.6*nz)
	case t.iShape:
		return t.cm * math.Min(1+(2*t.lamZ-0.6)*nz, 1+1.4*nz)
	}
	return t.cm * math.Min(1+(t.lamZ-0.2)*nz, 1+0.8*nz)
}

// kzyOpen is k_zy of Annex B Table B.2 (members susceptible to torsional
// deformations) at n_z, with C_mLT = cm.
func (t *iaTerms) kzyOpen(nz float64) float64 {
	d := t.cm - 0.25
	if !t.plastic {
		return math.Max(1-0.05*t.lamZ*nz/d, 1-0.05*nz/d)
	}
	k := math.Max(1-0.1*t.lamZ*nz/d, 1-0.1*nz/d)
	if t.lamZ < 0.4 {
		k = math.Min(0.6+t.lamZ, 1-0.1*t.lamZ*nz/d)
	}
	return k
}
