#pragma once
// The wavelength factors of one evaluation, each computed the first time a row needs it: a pulse train evaluates
// the rows of several durations at the same wavelength, and each factor costs a power of ten.
#include "beamwarden/limits/factors.hpp"
#include "beamwarden/limits/mpe.hpp"

#include <optional>

namespace beamwarden::limits {

class WavelengthFactors {
public:
    explicit WavelengthFactors(double lambda) : lambda_nm(lambda) {}

    const double lambda_nm;

    [[nodiscard]] double c2()
    {
        return once(m_c2, [this] { return factors::c2(lambda_nm); });
    }
    [[nodiscard]] double t1()
    {
        return once(m_t1, [this] { return factors::t1(lambda_nm); });
    }
    [[nodiscard]] double c3()
    {
        return once(m_c3, [this] { return factors::c3(lambda_nm); });
    }
    [[nodiscard]] double c4()
    {
        return once(m_c4, [this] { return factors::c4(lambda_nm); });
    }
    // C7's form belongs to the rule set; one object serves one set.
    [[nodiscard]] double c7(C7Rule rule)
    {
        return once(m_c7, [this, rule] { return factors::c7(rule, lambda_nm); });
    }

private:
    template <typename F>
    static double once(std::optional<double>& slot, F compute)
    {
        if (!slot)
            slot = compute();
        return *slot;
    }

    std::optional<double> m_c2, m_t1, m_c3, m_c4, m_c7;
};

// evaluateLimits (mpe.hpp) with the wavelength's factors shared between calls for the same wavelength and set.
[[nodiscard]] LimitSet evaluateLimits(const RuleSet& set, Target target, WavelengthFactors& at,
                                      units::Duration duration, units::Angle sourceAngle, units::Area skinArea,
                                      double alphaMaxOverride_rad = 0.0);

} // namespace beamwarden::limits
