package sim

import (
	"errors"
	"fmt"
	"math"
)

// Prior is the prior knowledge of Y = ln X for a conjugate normal update of
// a lognormal quantity X from test results, in the parameters of the
// Bayesian procedure of EN 1990:2002 Annex D (m', n', s', ν').
//
// The zero value is the vague prior with unknown variance: no information on
// the mean or the spread of ln X. Prior{Sigma: s} is the vague prior when the
// standard deviation s of ln X is known.
type Prior struct {
	// Sigma is the standard deviation of ln X when it is known. Zero means
	// unknown: the spread is then estimated from SD, Nu and the data.
	Sigma float64

	// Mean is m', the prior estimate of the mean of ln X.
	Mean float64
	// N is n', the weight of Mean counted in equivalent test results.
	// Zero means no prior information on the mean (Mean is ignored).
	N float64

	// SD is s', the prior estimate of the standard deviation of ln X.
	// It is ignored when Sigma is not zero.
	SD float64
	// Nu is ν', the degrees of freedom behind SD. Zero means no prior
	// information on the spread (SD is ignored). Ignored when Sigma is not
	// zero.
	Nu float64
}

// PriorKnownSigma returns the prior for ln X with known standard deviation
// sigma and a normal prior on its mean with mean m0 and standard deviation
// s0. s0 = +Inf gives the vague prior on the mean.
//
// The normal prior N(m0, s0²) is the same as m0 weighted as n' = sigma²/s0²
// test results (conjugate normal model with known variance).
func PriorKnownSigma(sigma, m0, s0 float64) Prior {
	return Prior{Sigma: sigma, Mean: m0, N: sigma * sigma / (s0 * s0)}
}

// PriorFromLognormal returns the unknown-variance prior whose estimates
// are those of a lognormal X with the given mean and coefficient of variation,
// worth n test results for the mean and nu degrees of freedom for the spread.
func PriorFromLognormal(mean, cov, n, nu float64) Prior {
	s := math.Sqrt(math.Log1p(cov * cov))
	return Prior{Mean: math.Log(mean) - s*s/2, N: n, SD: s, Nu: nu}
}

// Predictive returns the prior predictive distribution of X, for showing
// the prior beside the update. It fails when the prior is vague in the mean
// (or, with unknown variance, in the spread), since it is then improper.
func (p Prior) Predictive() (Dist, error) {
	if err := p.validate(); err != nil {
		return nil, err
	}
	post := Posterior{Sigma: p.Sigma, M: p.Mean, N: p.N, S: p.SD, Nu: p.Nu}
	if p.N == 0 {
		return nil, errors.New("sim: the prior has no information on the mean (N = 0): it has no predictive distribution")
	}
	if p.Sigma == 0 && p.Nu == 0 {
		return nil, errors.New("sim: the prior has no information on the spread (Nu = 0, Sigma = 0): it has no predictive distribution")
	}
	return post.Predictive(), nil
}

func (p Prior) validate() error {
	for _, v := range []struct {
		name string
		x    float64
	}{{"Sigma", p.Sigma}, {"Mean", p.Mean}, {"N", p.N}, {"SD", p.SD}, {"Nu", p.Nu}} {
		if math.IsNaN(v.x) || math.IsInf(v.x, 0) {
			return fmt.Errorf("sim: prior %s is %v; give a finite number", v.name, v.x)
		}
		if v.name != "Mean" && v.x < 0 {
			return fmt.Errorf("sim: prior %s is %g; it must not be negative", v.name, v.x)
		}
	}
	if p.Sigma == 0 && p.Nu > 0 && p.SD == 0 {
		return fmt.Errorf("sim: prior SD is 0 with Nu = %g; give the prior estimate of the standard deviation of ln X, or set Nu = 0", p.Nu)
	}
	return nil
}

// Posterior is the result of updating a Prior with test results: the
// parameters (m″, n″, s″, ν″) of the distribution of ln X.
type Posterior struct {
	// Sigma is the known standard deviation of ln X, or zero when the
	// variance was unknown and S, Nu describe it.
	Sigma float64
	// M is m″, the updated estimate of the mean of ln X.
	M float64
	// N is n″ = n' + n, the weight of M in test results.
	N float64
	// S is s″, the updated estimate of the standard deviation of ln X
	// (zero when Sigma is known).
	S float64
	// Nu is ν″, the degrees of freedom of S (zero when Sigma is known).
	Nu float64
	// Count is the number of test results used.
	Count int
}

// UpdateLognormal updates the prior of ln X with the test results data
// (values of X, all positive) by Bayes' rule, with the conjugate normal model
// on the log scale.
//
// Known variance (prior.Sigma > 0), the normal conjugate update of the mean
// (EN 1990:2002 Annex D, D.7 "V_X known" when the prior is vague):
//
//	n″ = n' + n,  m″ = (n' m' + n ȳ) / n″
//
// Unknown variance (prior.Sigma = 0), the normal-gamma update in the
// notation of Raiffa and Schlaifer, Applied Statistical Decision Theory
// (1961), as used for the Bayesian procedure behind EN 1990:2002 Annex D,
// D.7 "V_X unknown" (from memory), with ν = n - 1 and δ(n') = 1 when n' > 0,
// else 0:
//
//	n″ = n' + n,  ν″ = ν' + ν + δ(n'),  m″ = (n' m' + n ȳ) / n″
//	ν″ s″² + n″ m″² = ν' s'² + n' m'² + ν s_y² + n ȳ²
//
// where ȳ and s_y are the mean and standard deviation of ln data. With the
// vague prior (n' = ν' = 0) this gives m″ = ȳ, s″ = s_y, ν″ = n - 1.
func UpdateLognormal(prior Prior, data []float64) (*Posterior, error) {
	if err := prior.validate(); err != nil {
		return nil, err
	}
	n := len(data)
	var sum float64
	for i, x := range data {
		if !(x > 0) || math.IsInf(x, 1) {
			return nil, fmt.Errorf("sim: test result %d is %v; a lognormal update needs finite positive values", i+1, x)
		}
		sum += math.Log(x)
	}
	var ybar, ss float64 // mean and sum of squared deviations of ln data
	if n > 0 {
		ybar = sum / float64(n)
		for _, x := range data {
			d := math.Log(x) - ybar
			ss += d * d
		}
	}
	nn := prior.N + float64(n)
	if nn == 0 {
		return nil, errors.New("sim: no test results and a vague prior on the mean (N = 0); give data or an informative prior")
	}
	m := prior.Mean
	if n > 0 {
		m = (prior.N*prior.Mean + float64(n)*ybar) / nn
	}
	post := &Posterior{M: m, N: nn, Count: n}
	if prior.Sigma > 0 {
		post.Sigma = prior.Sigma
		return post, nil
	}

	nu := prior.Nu
	if n > 0 {
		nu += float64(n - 1)
		if prior.N > 0 {
			nu++
		}
	}
	if nu <= 0 {
		return nil, fmt.Errorf("sim: %d test result(s) and no prior information on the spread (Nu = 0) leave the standard deviation of ln X unknown; give at least 2 results, a prior SD with Nu > 0, or a known Sigma", n)
	}
	// ν″ s″² = ν' s'² + ν s_y² + n' n / n″ (ȳ - m')², the same as the
	// sum-of-squares form above, written to avoid cancellation.
	q := prior.Nu*prior.SD*prior.SD + ss
	if n > 0 && prior.N > 0 {
		d := ybar - prior.Mean
		q += prior.N * float64(n) / nn * d * d
	}
	if q == 0 {
		return nil, errors.New("sim: the test results have no scatter and the prior gives no spread; the standard deviation of ln X cannot be estimated — give a prior SD with Nu > 0 or a known Sigma")
	}
	post.Nu = nu
	post.S = math.Sqrt(q / nu)
	return post, nil
}

// Predictive returns the predictive distribution of one more value of X:
// lognormal with ln X ~ N(m″, σ²(1 + 1/n″)) when the variance is known,
// and log-Student-t with ν″ degrees of freedom,
// ln X = m″ + s″ sqrt(1 + 1/n″) T_ν″, when it is unknown.
//
// The log-Student-t has no finite mean or standard deviation; Mean and
// StdDev return +Inf. Use MeanEstimate for a finite estimate of the mean.
func (p *Posterior) Predictive() Dist {
	f := math.Sqrt(1 + 1/p.N)
	if p.Sigma > 0 {
		d, err := NewLognormalLog(p.M, p.Sigma*f)
		if err != nil {
			panic(err) // M finite and Sigma > 0 are checked by UpdateLognormal
		}
		return d
	}
	return newLogStudentsT(p.M, p.S*f, p.Nu)
}

// Fractile returns the q-fractile of the predictive distribution, e.g. the
// characteristic value for q = 0.05, as in EN 1990:2002 Annex D, D.7:
//
//	x_k = exp(m″ - k_n s″)
//
// with k_n = u_{1-q} sqrt(1 + 1/n″) for known variance (σ in place of s″)
// and k_n = t_{1-q, ν″} sqrt(1 + 1/n″) for unknown variance.
func (p *Posterior) Fractile(q float64) float64 {
	return p.Predictive().Quantile(q)
}

// MeanEstimate returns exp(m″ + s″²/2) (σ in place of s″ when known), the
// mean of the lognormal with the updated point estimates.
func (p *Posterior) MeanEstimate() float64 {
	s := p.S
	if p.Sigma > 0 {
		s = p.Sigma
	}
	return math.Exp(p.M + s*s/2)
}

// String describes the updated parameters.
func (p *Posterior) String() string {
	if p.Sigma > 0 {
		return fmt.Sprintf("ln X: mean %.4g (n'' %.3g), known sd %.4g; %d tests", p.M, p.N, p.Sigma, p.Count)
	}
	return fmt.Sprintf("ln X: mean %.4g (n'' %.3g), sd %.4g (nu'' %.3g); %d tests", p.M, p.N, p.S, p.Nu, p.Count)
}
