#include "beamwarden/limits/types.hpp"

namespace beamwarden::limits {

std::string_view toString(Target target)
{
    return target == Target::Eye ? "eye" : "skin";
}

std::string_view toString(RuleSetId set)
{
    return set == RuleSetId::Iec60825_1_2007 ? "iec60825-1:2007" : "iec60825-1:2014";
}

std::string_view toString(RuleChoice choice)
{
    switch (choice) {
    case RuleChoice::Strictest:
        return "strictest";
    case RuleChoice::Iec60825_1_2014:
        return "iec60825-1:2014";
    case RuleChoice::Iec60825_1_2007:
        return "iec60825-1:2007";
    }
    return "?";
}

std::string_view toString(C5Option option)
{
    return option == C5Option::Conservative ? "conservative" : "edition";
}

std::string_view toString(RowStatus status)
{
    switch (status) {
    case RowStatus::Verified:
        return "verified";
    case RowStatus::VerifiedEu:
        return "verified-EU";
    case RowStatus::Secondary:
        return "secondary";
    case RowStatus::Computed:
        return "computed";
    case RowStatus::Reconstructed:
        return "reconstructed";
    }
    return "?";
}

std::string_view toString(Effect effect)
{
    switch (effect) {
    case Effect::UvPhotochemical:
        return "uv-photochemical";
    case Effect::UvThermal:
        return "uv-thermal";
    case Effect::RetinalThermal:
        return "retinal-thermal";
    case Effect::RetinalPhotochemical:
        return "retinal-photochemical";
    case Effect::CornealThermal:
        return "corneal-thermal";
    case Effect::CornealSkinLimit:
        return "corneal-skin-limit";
    case Effect::SkinLimit:
        return "skin";
    }
    return "?";
}

std::string_view describe(Effect effect)
{
    switch (effect) {
    case Effect::UvPhotochemical:
        return "ultraviolet photochemical (cornea and lens)";
    case Effect::UvThermal:
        return "ultraviolet thermal (cornea)";
    case Effect::RetinalThermal:
        return "retinal thermal";
    case Effect::RetinalPhotochemical:
        return "retinal photochemical";
    case Effect::CornealThermal:
        return "corneal thermal";
    case Effect::CornealSkinLimit:
        return "cornea (skin MPE as a second eye limit)";
    case Effect::SkinLimit:
        return "skin";
    }
    return "?";
}

std::string_view toString(PulseRule rule)
{
    switch (rule) {
    case PulseRule::SinglePulse:
        return "single-pulse";
    case PulseRule::AveragePower:
        return "average-power";
    case PulseRule::PulseTrain:
        return "pulse-train";
    }
    return "?";
}

std::string_view toString(Factor factor)
{
    switch (factor) {
    case Factor::C1:
        return "C1";
    case Factor::C2:
        return "C2";
    case Factor::C3:
        return "C3";
    case Factor::C4:
        return "C4";
    case Factor::C5:
        return "C5";
    case Factor::C6:
        return "C6";
    case Factor::C7:
        return "C7";
    case Factor::T1:
        return "T1";
    case Factor::T2:
        return "T2";
    }
    return "?";
}

Result<Target> parseTarget(std::string_view text)
{
    if (text == "eye")
        return Target::Eye;
    if (text == "skin")
        return Target::Skin;
    return fail("target", std::string(text), "eye or skin");
}

Result<RuleChoice> parseRuleChoice(std::string_view text)
{
    for (const RuleChoice choice : {RuleChoice::Strictest, RuleChoice::Iec60825_1_2014, RuleChoice::Iec60825_1_2007}) {
        if (text == toString(choice))
            return choice;
    }
    return fail("rules", std::string(text), "strictest, iec60825-1:2014 or iec60825-1:2007");
}

Result<C5Option> parseC5Option(std::string_view text)
{
    if (text == "conservative")
        return C5Option::Conservative;
    if (text == "edition")
        return C5Option::Edition;
    return fail("c5", std::string(text), "conservative or edition");
}

std::string_view fullName(RuleSetId set)
{
    return set == RuleSetId::Iec60825_1_2007 ? "IEC 60825-1:2007 (ICNIRP 2000 basis)"
                                             : "IEC 60825-1:2014 (ICNIRP 2013 basis)";
}

} // namespace beamwarden::limits
