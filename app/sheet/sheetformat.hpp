#pragma once
// Numbers, verdicts and record fields in the sheet's words (translated), written the way the sheet's language
// writes numbers. Quantities come printed by core (units::format) and only their decimal separator changes.
#include "beamwarden/eyewear/protection.hpp"
#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/limits/types.hpp"
#include "beamwarden/model/records.hpp"

#include <QLocale>
#include <QString>

#include <string>
#include <string_view>

namespace beamwarden::sheet {

class SheetFormat {
public:
    explicit SheetFormat(const QString& language);

    [[nodiscard]] const QLocale& locale() const { return m_locale; }

    // Text printed by core with '.' decimals, with the locale's decimal separator.
    [[nodiscard]] QString number(const std::string& printed) const;
    [[nodiscard]] QString number(double value, int decimals) const;
    template <typename Q>
    [[nodiscard]] QString quantity(Q value, int significant = 4) const
    {
        return number(units::format(value, significant));
    }

    // "within limit" / "over limit ×N" (assessment::exposureVerdict), translated.
    [[nodiscard]] QString exposureVerdict(double ratio) const;
    // Required OD rounded up to one decimal ("none" when no filter is needed).
    [[nodiscard]] QString requiredOd(double exactOd) const;
    [[nodiscard]] QString divergence(units::Angle angle) const;
    [[nodiscard]] QString beamDiameter(units::Length diameter) const;
    [[nodiscard]] QString distance(const hazard::HazardDistance& distance) const;
    // An ISO 8601 time stamp as "2026-12-01 14:03 UTC" (dates stay ISO: unambiguous in every language).
    [[nodiscard]] static QString timeStamp(const std::string& iso);

    [[nodiscard]] static QString verdict(eyewear::Verdict verdict);
    [[nodiscard]] static QString status(model::AssessmentStatus status);
    [[nodiscard]] static QString laserClass(model::LaserClass laserClass);
    [[nodiscard]] static QString viewing(model::Viewing viewing);
    [[nodiscard]] static QString pulseRule(limits::PulseRule rule);
    // "IEC 60825-1:2014" from the set's full name (the basis in brackets is shown once, in the sheet's basis line).
    [[nodiscard]] static QString shortRuleSetName(limits::RuleSetId set);

private:
    QLocale m_locale;
};

[[nodiscard]] QString fromUtf8(std::string_view text);

} // namespace beamwarden::sheet
