#pragma once
// The content of the Limit curves panel's three charts, sampled from the engines for one assessed output and
// exposure case: MPE against exposure duration, required and available OD against wavelength, and exposure against
// distance with the NOHD. The engines compute every number; this only chooses where to sample and what to call it.
#include "beamwarden/assessment/assessment.hpp"
#include "plots/chartcontent.hpp"

#include <QCoreApplication>

#include <string>
#include <vector>

namespace beamwarden::gui {

class LimitCurveContent {
    Q_DECLARE_TR_FUNCTIONS(LimitCurveContent)
public:
    // Durations sampled for the MPE curves: about 200 per curve, log-spaced from 1e-13 s (1e-14 s for pulses shorter
    // than 100 fs) to 3e4 s, plus the exposure basis and the pulse duration themselves so the marks sit on the curve.
    [[nodiscard]] static std::vector<double> mpeDurations(const hazard::HazardResult& eye);

    [[nodiscard]] static ChartContent mpeAgainstDuration(const assessment::CaseAssessment& exposureCase,
                                                         const assessment::AssessmentOptions& options);
    // `outcomes` are the assessment's eyewear checks (by item name) for the verdict beside each item's name.
    [[nodiscard]] static ChartContent odAgainstWavelength(const assessment::CaseAssessment& exposureCase,
                                                          const std::string& outputName,
                                                          const std::vector<model::EyewearItem>& shelf,
                                                          const std::vector<assessment::EyewearOutcome>& outcomes);
    [[nodiscard]] static ChartContent exposureAgainstDistance(const assessment::CaseAssessment& exposureCase);
};

} // namespace beamwarden::gui
