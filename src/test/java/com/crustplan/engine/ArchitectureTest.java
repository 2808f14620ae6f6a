package com.crustplan.engine;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The physics engine stays a plain library (project rule: no Spring imports in
 * com.crustplan.engine..), so it can be tested, benchmarked and reused without an
 * application context.
 */
@AnalyzeClasses(packages = "com.crustplan.engine", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

	@ArchTest
	static final ArchRule shouldNotDependOnSpringOrPersistence = noClasses().that()
		.resideInAPackage("com.crustplan.engine..")
		.should()
		.dependOnClassesThat()
		.resideInAnyPackage("org.springframework..", "jakarta.persistence..", "jakarta.servlet..")
		.because("the engine has no Spring imports (project rule)");

	@ArchTest
	static final ArchRule shouldNotDependOnTheRestOfTheApplication = noClasses().that()
		.resideInAPackage("com.crustplan.engine..")
		.should()
		.dependOnClassesThat(resideInAPackage("com.crustplan..").and(not(resideInAPackage("com.crustplan.engine.."))))
		.because("pages, persistence and planners build on the engine, never the other way round");

	@ArchTest
	static final ArchRule shouldOnlyUseTheJdk = noClasses().that()
		.resideInAPackage("com.crustplan.engine..")
		.should()
		.dependOnClassesThat(not(resideInAnyPackage("com.crustplan.engine..", "java..", "")))
		.because("the engine is plain Java 17");

	@ArchTest
	static final ArchRule shouldHaveNoCyclesBetweenSubPackages = slices().matching("com.crustplan.engine.(*)..")
		.should()
		.beFreeOfCycles()
		.because("each engine package builds on the ones below it: the cook never imports what judges cooks");

	@ArchTest
	static final ArchRule cookShouldNotKnowAcrylamide = noClasses().that()
		.resideInAPackage("com.crustplan.engine.cook..")
		.should()
		.dependOnClassesThat()
		.resideInAnyPackage("com.crustplan.engine.acrylamide..", "com.crustplan.engine.assessment..")
		.because("acrylamide formation plugs into the cook as a layer reaction");

}
