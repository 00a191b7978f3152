package study

import (
	"math"

	"strutrisk/internal/column"
)

// At evaluates the member at the physical point x (one value per
// variable of Sim): the capacity result without the model factor, the
// member itself and its relative slenderness about the governing axis.
func (md *Model) At(x []float64) (res column.Result, m column.Member, relSlenderness float64, err error) {
	v := md.base
	for i, b := range md.binds {
		md.set(&v, b, x[i])
	}
	res, m, err = md.capacity(&v, md.Study.Axis)
	if err != nil {
		return res, m, math.NaN(), err
	}
	if md.mat.timber {
		// The slenderness picture's axes for timber (materialpicture.go):
		// the member's Fy is the strength k_mod f of all loads.
		lam, fy := timberAxes(&m, &v, res.Axis)
		m.Fy = fy
		return res, m, lam, nil
	}
	return res, m, column.RelativeSlenderness(&m, res.Axis), nil
}

// CurveChart returns the capacity ratio N / (A fy) of the nominal member
// against its relative slenderness as the length varies (model factor
// excluded), at n points up to relative slenderness lamMax, about the
// governing axis (ReferenceCurves gives every axis).
func (md *Model) CurveChart(n int, lamMax float64) (lam, ratio []float64) {
	nom, err := md.Nominal()
	if err != nil {
		return nil, nil
	}
	return md.curveAbout(nom, nom.Axis, n, lamMax, nil)
}
