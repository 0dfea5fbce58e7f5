package api

import (
	"errors"
	"fmt"
	"reflect"
	"regexp"
	"strings"
	"unicode"

	"colloidtriage/advisor/input"

	"github.com/go-playground/validator/v10"
)

// sampleValidator validates samples with JSON field names; the sample's
// contract gives each offending field its unit and valid range.
type sampleValidator struct {
	v        *validator.Validate
	contract *node
}

func newSampleValidator() *sampleValidator {
	v := validator.New(validator.WithRequiredStructEnabled())
	v.RegisterTagNameFunc(func(f reflect.StructField) string {
		name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
		if name == "-" {
			return ""
		}
		return name
	})
	return &sampleValidator{v: v, contract: contractOf(reflect.TypeOf(input.Sample{}))}
}

var index = regexp.MustCompile(`\[(\d+)\]`)

// validate checks a decoded sample against its tags and returns a problem
// naming every offending field.
func (sv *sampleValidator) validate(s *input.Sample) error {
	err := sv.v.Struct(s)
	var fields []input.FieldProblem
	if hasControl(s.SampleID) {
		fields = append(fields, input.FieldProblem{Pointer: "/sample_id",
			Reason: "holds a control character (NUL, a line break, ...)", Valid: "printable text"})
	}
	if err == nil && fields == nil {
		return nil
	}
	var ves validator.ValidationErrors
	if err != nil && !errors.As(err, &ves) {
		return err
	}
	for _, fe := range ves {
		ns := fe.Namespace()
		_, ns, _ = strings.Cut(ns, ".") // drop the root type name
		ptr := "/" + strings.ReplaceAll(index.ReplaceAllString(ns, ".$1"), ".", "/")
		var unit, valid, alternative string
		if n := sv.contract.at(ptr); n != nil {
			unit, valid, alternative = n.unit, n.valid, n.alternative
		}
		fields = append(fields, input.FieldProblem{Pointer: ptr, Reason: reason(fe, alternative), Unit: unit, Valid: valid})
	}
	return fail(fieldsInvalid,
		fmt.Sprintf("%d field(s) out of range or missing", len(fields)), fields...)
}

// hasControl reports whether s holds a control character (C0, DEL or C1):
// an identifier goes into logs, CSV files and spreadsheets as it is.
func hasControl(s string) bool {
	return strings.IndexFunc(s, unicode.IsControl) >= 0
}

// reason says why a field failed; alternative is the member that may stand
// in for a missing one.
func reason(fe validator.FieldError, alternative string) string {
	switch fe.Tag() {
	case "required":
		return "required"
	case "required_without":
		return "required unless " + alternative + " is given"
	case "oneof":
		return "not one of the allowed values"
	case "gt", "gte", "lt", "lte":
		return "out of range"
	case "min", "max":
		return "wrong number of items or characters"
	}
	return "invalid (" + fe.Tag() + ")"
}
