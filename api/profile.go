package api

import (
	"mime"
	"net/http"
	"strconv"
	"strings"

	"github.com/labstack/echo/v4"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
)

// svgContentType is the media type of the interaction-profile chart.
const svgContentType = "image/svg+xml"

type profileResponse struct {
	*advisor.Profile
	RequestID string `json:"request_id"`
}

// interactionProfile returns the interaction energy curve of two median
// particles of a sample (symptom optional) as JSON, or as an SVG chart when
// the client prefers image/svg+xml. The query parameter points sets the
// number of separations.
func (h *handlers) interactionProfile(c echo.Context) error {
	points, err := profilePoints(c)
	if err != nil {
		return err
	}
	svg, err := prefersSVG(c.Request().Header.Get(echo.HeaderAccept))
	if err != nil {
		return err
	}
	var s input.Sample
	if err := decodeJSON(c, &s); err != nil {
		return err
	}
	if s.Symptom == "" {
		s.Symptom = "settling" // the profile does not depend on it; the validator requires one
	}
	if err := h.validator.validate(&s); err != nil {
		return err
	}
	pr, err := h.engine.Profile(&s, points)
	if err != nil {
		return err
	}
	c.Response().Header().Add(echo.HeaderVary, echo.HeaderAccept)
	if svg {
		body, err := profileChart(pr)
		if err != nil {
			return err
		}
		return c.Blob(http.StatusOK, svgContentType, body)
	}
	return c.JSON(http.StatusOK, profileResponse{Profile: pr, RequestID: c.Response().Header().Get(echo.HeaderXRequestID)})
}

// profilePoints reads ?points=N, default advisor.ProfilePointsDefault.
func profilePoints(c echo.Context) (int, error) {
	q := c.QueryParams()
	if !q.Has("points") {
		return advisor.ProfilePointsDefault, nil
	}
	n, err := strconv.Atoi(q.Get("points"))
	if err != nil || n < advisor.ProfilePointsMin || n > advisor.ProfilePointsMax {
		valid := strconv.Itoa(advisor.ProfilePointsMin) + " <= value <= " + strconv.Itoa(advisor.ProfilePointsMax) + ", an integer"
		return 0, fail(queryInvalid,
			"the query parameter points must be an integer from "+strconv.Itoa(advisor.ProfilePointsMin)+
				" to "+strconv.Itoa(advisor.ProfilePointsMax),
			input.FieldProblem{Pointer: "?points", Reason: "not an integer in range", Unit: "1", Valid: valid})
	}
	return n, nil
}

// prefersSVG negotiates the response type from an Accept header (RFC 9110
// section 12.5.1): the chart when image/svg+xml has a higher quality than
// application/json, or the same quality and is named while JSON is only
// matched by a wildcard; JSON otherwise and without a header. A header that
// accepts neither (say text/html alone) is answered 406; ranges that do not
// parse are skipped.
func prefersSVG(accept string) (bool, error) {
	if strings.TrimSpace(accept) == "" {
		return false, nil
	}
	svg, json := acceptQuality{}, acceptQuality{}
	for _, r := range strings.Split(accept, ",") {
		mt, params, err := mime.ParseMediaType(strings.TrimSpace(r))
		if err != nil {
			continue
		}
		q := 1.0
		if v, ok := params["q"]; ok {
			if q, err = strconv.ParseFloat(v, 64); err != nil || q < 0 || q > 1 {
				continue
			}
		}
		svg.match(mt, "image", "svg+xml", q)
		json.match(mt, "application", "json", q)
	}
	switch {
	case svg.q > json.q:
		return true, nil
	case svg.q == json.q && svg.q > 0:
		return svg.specificity > json.specificity, nil
	case json.q > 0:
		return false, nil
	}
	return false, fail(mediaNotAcceptable,
		"this route answers application/json or "+svgContentType)
}

// acceptQuality is the quality of the most specific media range that
// matched a type: specificity 3 for type/subtype, 2 for type/*, 1 for */*.
type acceptQuality struct {
	q           float64
	specificity int
}

func (a *acceptQuality) match(mediaRange, typ, subtype string, q float64) {
	s := 0
	switch mediaRange {
	case typ + "/" + subtype:
		s = 3
	case typ + "/*":
		s = 2
	case "*/*":
		s = 1
	}
	if s > a.specificity {
		a.q, a.specificity = q, s
	}
}
