namespace OutputForge.Demo;

/// <summary>
/// The invented safety profile of QF-217: MedDRA-style preferred terms in 14 system organ classes,
/// a few common terms (5-15%), a long tail of rare ones, and dose-related nausea, dizziness,
/// somnolence, dysgeusia and decreased appetite. Incidences are invented, not taken from any product.
/// </summary>
internal static class AdverseEventCatalog
{
    private const string Infections = "Infections and infestations";
    private const string Nervous = "Nervous system disorders";
    private const string Gastrointestinal = "Gastrointestinal disorders";
    private const string Skin = "Skin and subcutaneous tissue disorders";
    private const string General = "General disorders and administration site conditions";
    private const string Musculoskeletal = "Musculoskeletal and connective tissue disorders";
    private const string Respiratory = "Respiratory, thoracic and mediastinal disorders";
    private const string Injury = "Injury, poisoning and procedural complications";
    private const string Psychiatric = "Psychiatric disorders";
    private const string Vascular = "Vascular disorders";
    private const string Investigations = "Investigations";
    private const string Metabolism = "Metabolism and nutrition disorders";
    private const string Cardiac = "Cardiac disorders";
    private const string Eye = "Eye disorders";

    public static IReadOnlyList<AdverseEventTerm> Terms { get; } =
    [
        T("Nasopharyngitis", Infections, 7.0, 7.5, 8.0, 0, 0.12, 7, false, "COMMON COLD", "NASOPHARYNGITIS", "COLD SYMPTOMS"),
        T("Upper respiratory tract infection", Infections, 4.0, 4.5, 4.5, 0, 0.08, 8, false, "UPPER RESPIRATORY TRACT INFECTION", "URTI"),
        T("Urinary tract infection", Infections, 2.0, 2.2, 2.5, 0.02, 0.10, 7, false, "URINARY TRACT INFECTION", "UTI"),
        T("Influenza", Infections, 1.5, 1.5, 1.6, 0.02, 0, 7, false, "INFLUENZA", "FLU"),
        T("Sinusitis", Infections, 1.2, 1.3, 1.2, 0, 0.05, 10, false, "SINUSITIS", "ACUTE SINUSITIS"),
        T("Gastroenteritis", Infections, 1.0, 1.0, 1.2, 0.03, 0, 4, false, "GASTROENTERITIS", "STOMACH FLU"),
        T("Bronchitis", Infections, 0.9, 1.0, 1.0, 0.03, 0, 12, false, "BRONCHITIS", "ACUTE BRONCHITIS"),
        T("Oral herpes", Infections, 0.6, 0.7, 0.8, 0, 0.15, 8, false, "COLD SORE", "HERPES LABIALIS"),
        T("Pneumonia", Infections, 0.3, 0.3, 0.4, 0.6, 0, 14, false, "PNEUMONIA", "COMMUNITY ACQUIRED PNEUMONIA"),
        T("Cellulitis", Infections, 0.4, 0.4, 0.4, 0.35, 0, 10, false, "CELLULITIS LEFT LOWER LEG", "CELLULITIS"),

        T("Headache", Nervous, 6.0, 7.5, 9.5, 0, 0.30, 2, false, "HEADACHE", "TENSION HEADACHE", "HEAD ACHE"),
        T("Dizziness", Nervous, 1.5, 3.5, 6.0, 0.01, 0.25, 2, true, "DIZZINESS", "FEELING DIZZY", "LIGHTHEADEDNESS"),
        T("Somnolence", Nervous, 1.0, 2.0, 3.5, 0, 0.20, 5, true, "SOMNOLENCE", "DROWSINESS", "SLEEPINESS"),
        T("Dysgeusia", Nervous, 0.3, 1.0, 2.2, 0, 0, 20, true, "METALLIC TASTE", "TASTE DISTURBANCE"),
        T("Migraine", Nervous, 0.6, 0.7, 0.8, 0, 0.25, 2, false, "MIGRAINE"),
        T("Paraesthesia", Nervous, 0.5, 0.5, 0.7, 0, 0, 6, false, "TINGLING IN HANDS", "PARESTHESIA"),

        T("Nausea", Gastrointestinal, 2.5, 6.0, 11.0, 0, 0.25, 4, true, "NAUSEA", "FEELING SICK", "QUEASINESS"),
        T("Diarrhoea", Gastrointestinal, 3.0, 3.4, 4.5, 0.01, 0.15, 3, false, "DIARRHEA", "LOOSE STOOLS"),
        T("Vomiting", Gastrointestinal, 1.0, 1.6, 3.0, 0.01, 0.10, 1, true, "VOMITING", "EMESIS"),
        T("Constipation", Gastrointestinal, 1.0, 1.8, 2.8, 0, 0.10, 6, true, "CONSTIPATION"),
        T("Abdominal pain upper", Gastrointestinal, 1.2, 1.5, 2.0, 0, 0.10, 3, false, "UPPER ABDOMINAL PAIN", "EPIGASTRIC PAIN"),
        T("Dyspepsia", Gastrointestinal, 0.8, 1.0, 1.4, 0, 0.10, 5, false, "DYSPEPSIA", "INDIGESTION"),
        T("Dry mouth", Gastrointestinal, 0.5, 1.4, 2.4, 0, 0, 15, true, "DRY MOUTH"),

        T("Pruritus", Skin, 2.2, 1.3, 1.0, 0, 0.10, 9, false, "WORSENING OF ITCH", "PRURITUS, GENERALISED"),
        T("Rash", Skin, 1.0, 1.2, 1.5, 0, 0.05, 7, false, "RASH", "SKIN RASH ON ARMS"),
        T("Eczema", Skin, 1.0, 0.9, 0.9, 0, 0.10, 12, false, "ECZEMA", "ECZEMA FLARE"),
        T("Dry skin", Skin, 0.8, 0.9, 1.0, 0, 0, 20, false, "DRY SKIN", "XEROSIS"),
        T("Urticaria", Skin, 0.6, 0.7, 0.8, 0, 0.10, 3, false, "HIVES", "URTICARIA"),

        T("Fatigue", General, 2.0, 3.0, 4.5, 0, 0.10, 7, true, "FATIGUE", "TIREDNESS"),
        T("Pyrexia", General, 1.0, 1.0, 1.1, 0.01, 0.05, 2, false, "FEVER", "PYREXIA"),
        T("Oedema peripheral", General, 0.5, 0.6, 0.6, 0, 0, 14, false, "ANKLE SWELLING", "PERIPHERAL EDEMA"),
        T("Asthenia", General, 0.4, 0.5, 0.8, 0, 0, 10, false, "WEAKNESS", "ASTHENIA"),

        T("Back pain", Musculoskeletal, 2.5, 2.5, 2.7, 0, 0.10, 6, false, "BACK PAIN", "PAIN IN BACK, LOWER"),
        T("Arthralgia", Musculoskeletal, 2.0, 2.0, 2.2, 0, 0.10, 8, false, "JOINT PAIN", "ARTHRALGIA"),
        T("Myalgia", Musculoskeletal, 1.0, 1.1, 1.2, 0, 0.05, 4, false, "MUSCLE ACHES", "MYALGIA"),
        T("Pain in extremity", Musculoskeletal, 0.8, 0.8, 0.9, 0, 0, 5, false, "PAIN IN RIGHT LEG", "LEFT ARM PAIN"),
        T("Muscle spasms", Musculoskeletal, 0.6, 0.6, 0.8, 0, 0.15, 2, false, "MUSCLE CRAMPS", "MUSCLE SPASM"),

        T("Cough", Respiratory, 2.0, 2.1, 2.2, 0, 0.05, 9, false, "COUGH", "DRY COUGH"),
        T("Oropharyngeal pain", Respiratory, 1.5, 1.5, 1.5, 0, 0.05, 4, false, "SORE THROAT", "THROAT PAIN"),
        T("Nasal congestion", Respiratory, 0.8, 0.8, 0.9, 0, 0, 6, false, "NASAL CONGESTION", "STUFFY NOSE"),
        T("Dyspnoea", Respiratory, 0.4, 0.4, 0.5, 0.05, 0, 5, false, "SHORTNESS OF BREATH"),
        T("Asthma", Respiratory, 0.3, 0.3, 0.3, 0.15, 0.10, 6, false, "ASTHMA EXACERBATION"),

        T("Contusion", Injury, 0.8, 0.8, 0.9, 0, 0, 7, false, "BRUISE ON KNEE", "CONTUSION"),
        T("Fall", Injury, 0.5, 0.6, 1.0, 0.08, 0, 1, false, "FALL", "FALL AT HOME"),
        T("Ligament sprain", Injury, 0.5, 0.5, 0.5, 0, 0, 14, false, "SPRAINED ANKLE", "LIGAMENT SPRAIN"),
        T("Excoriation", Injury, 0.9, 0.6, 0.5, 0, 0.10, 7, false, "SCRATCH MARKS", "EXCORIATION"),

        T("Insomnia", Psychiatric, 1.5, 1.6, 2.0, 0, 0.05, 10, false, "INSOMNIA", "DIFFICULTY SLEEPING"),
        T("Anxiety", Psychiatric, 0.8, 0.8, 0.9, 0, 0, 14, false, "ANXIETY"),
        T("Depression", Psychiatric, 0.4, 0.4, 0.5, 0.10, 0, 30, false, "DEPRESSED MOOD", "DEPRESSION"),

        T("Hypertension", Vascular, 1.5, 1.5, 1.7, 0, 0, 30, false, "HYPERTENSION", "HIGH BLOOD PRESSURE"),
        T("Orthostatic hypotension", Vascular, 0.2, 0.5, 1.0, 0.03, 0.10, 2, true, "ORTHOSTATIC HYPOTENSION", "DIZZY ON STANDING UP"),

        T("Alanine aminotransferase increased", Investigations, 0.8, 1.2, 1.8, 0, 0, 14, true, "ALT INCREASED", "ELEVATED ALT"),
        T("Blood creatine phosphokinase increased", Investigations, 0.6, 0.6, 0.7, 0, 0, 10, false, "CPK ELEVATED"),
        T("Weight increased", Investigations, 0.4, 0.5, 0.5, 0, 0, 40, false, "WEIGHT GAIN"),

        T("Decreased appetite", Metabolism, 0.5, 1.0, 2.0, 0, 0, 12, true, "DECREASED APPETITE", "LOSS OF APPETITE"),
        T("Hypercholesterolaemia", Metabolism, 0.4, 0.4, 0.4, 0, 0, 60, false, "HIGH CHOLESTEROL"),

        T("Palpitations", Cardiac, 0.5, 0.6, 0.7, 0, 0.10, 1, false, "PALPITATIONS"),
        T("Atrial fibrillation", Cardiac, 0.15, 0.15, 0.2, 0.5, 0, 5, false, "ATRIAL FIBRILLATION", "NEW ONSET AF"),

        T("Dry eye", Eye, 0.5, 0.5, 0.6, 0, 0, 20, false, "DRY EYES"),
        T("Vision blurred", Eye, 0.3, 0.6, 1.0, 0, 0.10, 2, true, "BLURRED VISION"),
    ];

    private static AdverseEventTerm T(
        string term, string soc, double placebo, double low, double high,
        double serious, double repeat, double medianDays, bool drugRelated, params string[] verbatims) =>
        new(term, soc, [placebo, low, high], serious, repeat, medianDays, drugRelated, verbatims);
}
