package sim

import (
	"errors"
	"fmt"
)

// ErrUnsuited is matched (errors.Is) by the error of Run when the method
// chosen in Settings cannot be used for the model or the budget given, for
// example ConditionalQMC on a model with no linear input or with fewer
// samples than replicates. The fix is in the input: another method or a
// larger budget.
var ErrUnsuited = errors.New("sim: method unsuited to the model or budget")

// unsuitedError is an error with its own text that matches ErrUnsuited.
type unsuitedError struct{ msg string }

func (e *unsuitedError) Error() string        { return e.msg }
func (e *unsuitedError) Is(target error) bool { return target == ErrUnsuited }

// unsuitedf formats an error that matches ErrUnsuited.
func unsuitedf(format string, a ...any) error {
	return &unsuitedError{fmt.Sprintf(format, a...)}
}
