package api

import (
	"errors"
	"fmt"
	"reflect"
	"regexp"
	"strings"

	"colloidtriage/advisor/input"

	"github.com/go-playground/validator/v10"
)

// fieldRule is what the contract says about one request field: its unit and
// its valid range, read once from the `unit` and `validate` tags.
type fieldRule struct {
	unit, valid string
}

// sampleValidator validates samples with JSON field names and knows, for each
// JSON pointer (array indices as *), the field's unit and valid range.
type sampleValidator struct {
	v     *validator.Validate
	rules map[string]fieldRule
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
	sv := &sampleValidator{v: v, rules: map[string]fieldRule{}}
	sv.collect(reflect.TypeOf(input.Sample{}), "")
	return sv
}

func (sv *sampleValidator) collect(t reflect.Type, prefix string) {
	for t.Kind() == reflect.Pointer || t.Kind() == reflect.Slice {
		if t.Kind() == reflect.Slice {
			prefix += "/*"
		}
		t = t.Elem()
	}
	if t.Kind() != reflect.Struct {
		return
	}
	for i := 0; i < t.NumField(); i++ {
		f := t.Field(i)
		name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
		ptr := prefix + "/" + name
		sv.rules[ptr] = fieldRule{unit: f.Tag.Get("unit"), valid: describeTag(f.Tag.Get("validate"))}
		sv.collect(f.Type, ptr)
	}
}

// describeTag turns validator tags into a range a person can read.
func describeTag(tag string) string {
	var lo, hi string
	var parts []string
	for _, t := range strings.Split(tag, ",") {
		k, v, _ := strings.Cut(t, "=")
		switch k {
		case "gt":
			lo = v + " < value"
		case "gte":
			lo = v + " <= value"
		case "lt":
			hi = "value < " + v
		case "lte":
			hi = "value <= " + v
		case "oneof":
			parts = append(parts, "one of: "+strings.ReplaceAll(v, " ", ", "))
		case "max":
			parts = append(parts, "at most "+v+" items or characters")
		case "min":
			parts = append(parts, "at least "+v+" items")
		}
	}
	switch {
	case lo != "" && hi != "":
		parts = append([]string{lo + strings.TrimPrefix(hi, "value")}, parts...)
	case lo != "":
		parts = append([]string{lo}, parts...)
	case hi != "":
		parts = append([]string{hi}, parts...)
	}
	return strings.Join(parts, "; ")
}

var index = regexp.MustCompile(`\[(\d+)\]`)

// validate checks a decoded sample against its tags and returns a problem
// naming every offending field.
func (sv *sampleValidator) validate(s *input.Sample) error {
	err := sv.v.Struct(s)
	if err == nil {
		return nil
	}
	var ves validator.ValidationErrors
	if !errors.As(err, &ves) {
		return err
	}
	fields := make([]input.FieldProblem, 0, len(ves))
	for _, fe := range ves {
		ns := fe.Namespace()
		_, ns, _ = strings.Cut(ns, ".") // drop the root type name
		ptr := "/" + strings.ReplaceAll(index.ReplaceAllString(ns, ".$1"), ".", "/")
		rule := sv.rules[index.ReplaceAllString("/"+strings.ReplaceAll(ns, ".", "/"), "/*")]
		fields = append(fields, input.FieldProblem{Pointer: ptr, Reason: reason(fe), Unit: rule.unit, Valid: rule.valid})
	}
	return newProblem(422, typeInvalidSample, "The sample has invalid fields",
		fmt.Sprintf("%d field(s) out of range or missing", len(fields)), fields...)
}

func reason(fe validator.FieldError) string {
	switch fe.Tag() {
	case "required":
		return "required"
	case "required_without":
		return "required unless " + snake(fe.Param()) + " is given"
	case "oneof":
		return "not one of the allowed values"
	case "gt", "gte", "lt", "lte":
		return "out of range"
	case "min", "max":
		return "wrong number of items or characters"
	}
	return "invalid (" + fe.Tag() + ")"
}

// snake turns a Go field name into its JSON spelling (SizeDistribution ->
// size_distribution).
func snake(goName string) string {
	var b strings.Builder
	for i, r := range goName {
		if r >= 'A' && r <= 'Z' {
			if i > 0 {
				b.WriteByte('_')
			}
			r += 'a' - 'A'
		}
		b.WriteRune(r)
	}
	return b.String()
}
